import { flaskFor } from '../../preparation/warnings.js';
import { notesJson } from '../../errors/note-json.js';
import { hillAside, speciesText } from '../../preparation/species.js';
import type { Command } from 'commander';
import { fail } from '../../errors/pondus-error.js';
import { readKeyValuePair } from '../../key-values/read-key-values.js';
import { BENCH_CAUTION } from '../../preparation/caution.js';
import { displayInstruction, displayResult, massUnitFor, volumeUnitFor, type Instruction } from '../../sigfig/instruction.js';
import { solutionPlan, type PurityBasis, type SolutionResult } from '../../preparation/solution.js';
import { concentratedJson, solutionJson, solutionJsonLine, substituteJson } from '../../preparation/prepare-json.js';
import { substituteForm, type SubstituteResult } from '../../preparation/substitute.js';
import { concentratedReagent, type ConcentratedResult } from '../../preparation/concentrated.js';
import { CONCENTRATED_CAUTION } from '../../preparation/caution.js';
import { displayMolarMass } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { conflict, given, roundingOf, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { prepSheetPresenter, readPrepSheet, type PrepSheetCliOptions } from './prep-sheet.js';
import type { PrepRowResult } from '../../preparation/prep-sheet.js';
import { runWithSheet } from './sheet-runner.js';
import { declarePrepare } from './declarations.js';
import { decimalCell } from '../output/format.js';

interface PrepareCliOptions extends OutputOptions, RoundingOptions, PrepSheetCliOptions {
  concentration?: string;
  volume?: string;
  purity?: string;
  purityBasis?: PurityBasis;
  as?: string;
  replace?: string;
  weighed?: string;
  fraction?: string;
  density?: string;
  abbreviations?: boolean;
}

type Prepared = { kind: 'solution'; r: SolutionResult } | { kind: 'substitute'; r: SubstituteResult } | { kind: 'concentrated'; r: ConcentratedResult };


/**
 * Checks which options of `prepare` go together; a conflict is a usage error (exit status 2).
 *
 * @example
 * checkPrepareOptions({ replace: 'CuSO4=10.00 g', volume: '1 L' }) // throws USAGE
 */
export function checkPrepareOptions(o: PrepareCliOptions): void {
  if (o.density !== undefined && o.fraction === undefined) throw fail({ code: 'USAGE', message: "--density is the density of a concentrated liquid reagent: give its mass fraction too (--fraction '37 %')" });
  if (o.fraction !== undefined) {
    const clash = given(o, { purity: '--purity', purityBasis: '--purity-basis', as: '--as', weighed: '--weighed', replace: '--replace' });
    if (clash.length) throw conflict('--fraction', clash, 'a concentrated liquid reagent is measured by volume from its mass fraction and density; the options of a solid to weigh do not apply');
    if ((o.concentration === undefined) !== (o.volume === undefined)) throw fail({ code: 'USAGE', message: "give both --concentration and --volume for the volume of concentrated reagent to take (or neither, for its molarity alone)" });
    return;
  }
  if (o.replace !== undefined) {
    const clash = given(o, { concentration: '--concentration', volume: '--volume', as: '--as', weighed: '--weighed', purityBasis: '--purity-basis' });
    if (clash.length) throw conflict('--replace', clash, 'it weighs one form of a reagent in place of an amount of another; to make up a solution, name the form in hand and give --concentration and --volume without --replace');
    if ((readKeyValuePair(o.replace)?.keyText ?? '') === '') throw fail({ code: 'USAGE', message: "--replace takes FORM=AMOUNT, e.g. --replace 'CuSO4=10.00 g'" });
    return;
  }
  if (o.volume === undefined || (o.concentration === undefined && o.weighed === undefined)) {
    throw fail({ code: 'USAGE', message: "give --concentration and --volume (e.g. --concentration '0.100 M' --volume '250.0 mL'), --weighed and --volume for the concentration made, or --replace FORM=AMOUNT" });
  }
  if (o.purityBasis !== undefined && o.purity === undefined) throw fail({ code: 'USAGE', message: '--purity-basis needs --purity: it says what the assay is of' });
  if (o.purityBasis === 'part' && o.as === undefined) throw fail({ code: 'USAGE', message: "--purity-basis part needs --as: the assay is of that part (e.g. --as C17H19NO3 for a potency 'as base')" });
}

/** The presenter for `pondus prepare` (a prep sheet with --sheet). */
export function preparePresenter(o: PrepareCliOptions): Presenter<Prepared> | Presenter<PrepRowResult> {
  if (o.sheet !== undefined) {
    const clash = given(o, { concentration: '--concentration', volume: '--volume', purity: '--purity', purityBasis: '--purity-basis', as: '--as', replace: '--replace', weighed: '--weighed', fraction: '--fraction', density: '--density' });
    if (clash.length) throw conflict('--sheet', clash, 'each row of the sheet gives its own reagent, purity, target and volume');
    return prepSheetPresenter(o);
  }
  return oneSolutionPresenter(o);
}

function oneSolutionPresenter(o: PrepareCliOptions): Presenter<Prepared> {
  checkPrepareOptions(o);
  const rounding = roundingOf(o);
  const options = { abbreviations: !!o.abbreviations, weights: o.weights ?? 'standard' };
  const w = (i: Instruction, unit?: string) => displayInstruction(i, unit ?? i.quantity.unit?.symbol, rounding).text;
  const wm = (i: Instruction) => w(i, massUnitFor(i.quantity));
  const res = (q: Parameters<typeof displayResult>[0], unit?: string) => displayResult(q, unit ?? q.unit?.symbol, rounding).text;
  const concentrated = o.fraction !== undefined;
  const takeText = (r: ConcentratedResult) => (r.take ? w(r.take, volumeUnitFor(r.take.quantity, r.volume!.unit)) : '');
  // the options are the batch's: what they say alone is read once, on the first reagent
  const solution = solutionPlan({ ...options, concentration: o.concentration, volume: o.volume!, purity: o.purity, purityBasis: o.purityBasis, as: o.as, weighed: o.weighed });
  const compute = (input: string): Prepared => {
    if (concentrated) return { kind: 'concentrated', r: concentratedReagent(input, { ...options, fraction: o.fraction!, density: o.density, concentration: o.concentration, volume: o.volume }) };
    if (o.replace !== undefined) {
      const pair = readKeyValuePair(o.replace)!;
      return { kind: 'substitute', r: substituteForm(input, pair.key, pair.valueText, { ...options, purity: o.purity }) };
    }
    return { kind: 'solution', r: solution(input) };
  };
  return {
    compute,
    // a solution's row straight from its result, without the row object (the same text)
    ...(concentrated || o.replace !== undefined ? {} : { jsonRow: (input: string, line: number) => solutionJsonLine(solution(input), o, rounding, line) }),
    json: (p) => (p.kind === 'solution' ? solutionJson(p.r, o, rounding) : p.kind === 'concentrated' ? concentratedJson(p.r, { ...o, fraction: o.fraction! }, rounding) : substituteJson(p.r, readKeyValuePair(o.replace!)!.value, rounding)),
    columns: concentrated ? ['input', 'formula', 'fraction', 'density_g_per_mL', 'molarity_M', 'molarity', 'take_L', 'take'] : ['input', 'formula', 'mass', 'display', 'made'],
    cells: (p) =>
      p.kind === 'concentrated'
        ? [p.r.reagent.input, p.r.reagent.formula, o.fraction!.trim(), p.r.density.value.div(1000).toFixed(), p.r.molarity.value.toNumber(), res(p.r.molarity, 'M'), p.r.take ? decimalCell(p.r.take.quantity.value) : '', takeText(p.r)]
        : p.kind === 'solution'
        ? [p.r.reagent.input, p.r.reagent.formula, p.r.mass ? decimalCell(p.r.mass.quantity.value) : '', p.r.mass ? wm(p.r.mass) : '', p.r.made ? res(p.r.made, p.r.unit) : '']
        : [p.r.use.input, p.r.use.formula, decimalCell(p.r.mass.quantity.value), wm(p.r.mass), ''],
    block: (p) => {
      if (p.kind === 'concentrated') {
        const r = p.r;
        const dens = o.density?.trim() ?? `${r.grade!.density} g/mL`;
        const lines = [
          `${r.reagent.input}  (${hillAside(r.reagent)}M = ${displayMolarMass(r.reagent)} g/mol), concentrated reagent: ${o.fraction!.trim()}, density ${dens}${r.densitySource === 'table' ? ' (table of common grades)' : ''}`,
          `  molarity w·ρ/M = ${res(r.molarity, 'M')} (${res(r.massConcentration, 'g/L')} of ${speciesText(r.reagent)}; nominal, from the label values)`,
        ];
        if (r.take) {
          lines.push(`  for ${o.concentration!.trim()} in ${o.volume!.trim()}: take ${takeText(r)} of the concentrated reagent (measure it by volume; do not weigh the solute)`);
          lines.push(
            r.acid
              ? `  put about half of the water in the ${flaskFor(r.reagent.formula)} first, add the acid slowly with swirling, let it cool, then make up to ${o.volume!.trim()}`
              : `  put most of the water in the flask first, add the reagent slowly, let it reach room temperature, then make up to ${o.volume!.trim()}`,
          );
        }
        return lines.join('\n');
      }
      if (p.kind === 'substitute') {
        const r = p.r;
        const lines = [
          `use ${r.use.input} (M = ${displayMolarMass(r.use)} g/mol) instead of ${r.instead.input} (M = ${displayMolarMass(r.instead)} g/mol):`,
          `  ${readKeyValuePair(o.replace!)!.value} of ${r.instead.input} = ${w(r.moles, 'mol')}`,
        ];
        if (r.purity) lines.push(`  assay of ${r.use.input} ${res(r.purity, '%')}: ${wm(r.pureMass)} ÷ ${res(r.purity, '%')}`);
        lines.push(`  weigh ${wm(r.mass)} of ${r.use.input}`);
        return lines.join('\n');
      }
      const r = p.r;
      const lines = [`${r.reagent.input}  (${hillAside(r.reagent)}M = ${displayMolarMass(r.reagent)} g/mol)`];
      const of = r.target.formula !== r.reagent.formula ? ` of ${r.target.written} (${r.target.perReagent} per formula unit)` : '';
      if (r.concentration && r.mass) {
        lines.push(`  target: ${o.concentration!.trim()}${of} in ${o.volume!.trim()}`);
        if (r.purityBasis === 'part') {
          lines.push(`  amount of ${r.target.written}: ${w(r.targetMoles!, 'mol')}; mass of ${r.target.written} ${wm(r.pureMass!)}`);
          lines.push(`  content of ${r.target.written} ${res(r.purity!, '%')} (potency): ${wm(r.pureMass!)} ÷ ${res(r.purity!, '%')}`);
        } else {
          lines.push(`  amount of ${r.reagent.input}: ${w(r.moles!, 'mol')}; pure mass ${wm(r.pureMass!)}`);
          if (r.purity) lines.push(`  assay ${res(r.purity, '%')}: ${wm(r.pureMass!)} ÷ ${res(r.purity, '%')}`);
        }
        lines.push(`  weigh ${wm(r.mass)} of ${r.reagent.input}, dissolve, and make up to ${o.volume!.trim()}`);
      }
      if (r.made && r.weighed) {
        lines.push(`  made: ${o.weighed!.trim()} of ${r.reagent.input}${r.purity ? ` (assay ${o.purity!.trim()})` : ''} in ${o.volume!.trim()} gives ${res(r.made, r.unit)}${r.made && of ? ` of ${r.target.written}` : ''}`);
      }
      return lines.join('\n');
    },
    notes: (p) => p.r.notes,
    noteItems: (p) => notesJson(p.r.notes),
    caution: concentrated ? CONCENTRATED_CAUTION : BENCH_CAUTION,
  };
}

/** Registers `pondus prepare`. */
export function registerPrepare(program: Command, run: CommandRunner, stdin?: () => AsyncIterable<string | Buffer>): void {
  declarePrepare(program).action((inputs: string[], o: PrepareCliOptions) => (o.sheet !== undefined && stdin ? runWithSheet(run, 'prepare', inputs, o, stdin, readPrepSheet) : run('prepare', inputs, o)));
}
