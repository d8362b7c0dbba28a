import type { Command } from 'commander';
import { composition, compositionDetail, type CompositionDetail } from '../../composition/element-shares.js';
import { mixtureComposition, mixtureJson, type MixtureResult } from '../../composition/mixture.js';
import { displayMeasured } from '../../sigfig/round.js';
import { COMPOSITION_LONG_COLUMNS, compositionCsvColumns, compositionCsvLongRows, compositionCsvRow, compositionJson, compositionJsonLine } from '../../composition/composition-json.js';
import { amountText } from '../../formula/amount.js';
import { displayElementMass, displayElementPercent, displayMolarMass, displayPercent, fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { fail } from '../../errors/pondus-error.js';
import { joinPairArgs, takeJoinedNote } from '../input/key-value-args.js';
import { outputFormat, refuseUnusedRounding, type FormulaOptions, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { declareComposition } from './declarations.js';

interface CompositionCliOptions extends FormulaOptions, RoundingOptions, OutputOptions {
  part?: string;
  mixture?: boolean;
  long?: boolean;
  /** Inputs joined from single formula=mass arguments, with the note saying so (set by the command). */
  joined?: Record<string, string>;
}

/** The presenter for `pondus composition --mixture`: inputs are `formula=mass` lists. */
export function mixturePresenter(o: CompositionCliOptions): Presenter<MixtureResult> {
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations };
  const rounding = o.rounding ?? 'half-even';
  const list = (shares: MixtureResult['components']) => shares.map((s) => `${s.name}=${displayMeasured(s.massPercent, rounding).text}`).join(' ');
  return {
    compute: (input) => {
      const r = mixtureComposition(input, opts);
      const joined = takeJoinedNote(o.joined, input);
      if (joined) r.notes.unshift({ code: 'JOINED_ARGUMENTS', message: joined });
      return r;
    },
    json: (r) => mixtureJson(r, rounding),
    columns: ['input', 'totalMass', 'byComponent', 'byElement'],
    cells: (r) => [r.input, r.total.value.toFixed(), list(r.components), list(r.elements)],
    notes: (r) => r.notes,
    noteItems: (r) => r.notes,
    block: (r) => {
      const rows = (shares: MixtureResult['components']) => shares.map((s) => [s.name, displayMeasured(s.mass, rounding).text, displayMeasured(s.massPercent, rounding).text]);
      return [
        `${r.input}   total ${displayMeasured(r.total, rounding).text} g`,
        fixedTable(['component', 'mass g', 'mass %'], rows(r.unaccounted ? [...r.components, r.unaccounted] : r.components), ['left', 'right', 'right']),
        fixedTable(['element', 'mass g', 'mass %'], rows(r.elements), ['left', 'right', 'right']),
      ].join('\n');
    },
  };
}

/** The presenter for `pondus composition`. */
export function compositionPresenter(o: CompositionCliOptions): Presenter<CompositionDetail> | Presenter<MixtureResult> {
  if (o.long && outputFormat(o) !== 'csv' && outputFormat(o) !== 'tsv') throw fail({ code: 'USAGE', message: '--long shapes CSV and TSV output (one row per element): add --csv or --tsv, or drop --long' });
  return o.mixture ? mixturePresenter(o) : formulaPresenter(o);
}

function formulaPresenter(o: CompositionCliOptions): Presenter<CompositionDetail> {
  refuseUnusedRounding(o);
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations, part: o.part };
  const rounding = o.rounding ?? 'half-even';
  const withPart = o.part !== undefined;
  const long = !!o.long;
  return {
    compute: (input) => compositionDetail(input, opts),
    json: (d) => compositionJson(d.result),
    jsonLine: (d) => compositionJsonLine(d.result),
    jsonRow: (input, line) => compositionJsonLine(composition(input, opts), line),
    columns: long ? [...COMPOSITION_LONG_COLUMNS, ...(withPart ? ['part', 'partCount', 'partMassPercent'] : [])] : ['input', 'formula', 'molarMass'],
    cells: (d) => [d.result.input, d.result.formula, d.result.molarMassExact],
    delimited: long
      ? { columns: () => [...COMPOSITION_LONG_COLUMNS, ...(withPart ? ['part', 'partCount', 'partMassPercent'] : [])], rows: (d) => ({ rows: compositionCsvLongRows(d.result, withPart), notes: [] }) }
      : {
          columns: (first) => compositionCsvColumns(first.map((d) => d.result), withPart),
          rows: (d, columns) => {
            const row = compositionCsvRow(d.result, columns);
            return { rows: [row.cells], notes: row.notes };
          },
        },
    block: (d) => {
      const r = d.result;
      const rows = r.elements.map((e, i) => [e.symbol, amountText(d.mass.vector.counts[i]), displayElementMass(d.mass, i), displayElementPercent(d.mass, i, rounding)]);
      const lines = [`${r.input}  →  ${r.formula}   M = ${displayMolarMass(d.mass, rounding)} g/mol`];
      lines.push(fixedTable(['element', 'count', 'mass g/mol', 'mass %'], rows, ['left', 'right', 'right', 'right']));
      if (d.part) {
        lines.push(`${d.part.part}: ${amountText(d.part.count)} × ${d.part.unitMass.toFixed()} g/mol = ${d.part.mass.toFixed()} g/mol, ${displayPercent(d.part.massPercent, rounding)} % by mass`);
      }
      return lines.join('\n');
    },
    notes: (d) => d.result.notes,
    noteItems: (d) => d.result.notes,
  };
}

/** Registers `pondus composition`. */
export function registerComposition(program: Command, run: CommandRunner): void {
  declareComposition(program).action((formulas: string[], o: CompositionCliOptions) => {
    if (!o.mixture) return run('composition', formulas, o);
    const { inputs, joined } = joinPairArgs(formulas, { what: 'mixture', units: true });
    const options: CompositionCliOptions = { ...o, joined };
    return run('composition', inputs, options);
  });
}
