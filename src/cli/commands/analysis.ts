import type { Command } from 'commander';
import { analysis, type AnalysisResult } from '../../analysis/check.js';
import { PARTNER_PENALTY } from '../../analysis/solvate-fit.js';
import { analysisJson, analysisJsonLine } from '../../analysis/analysis-json.js';
import { readSheet, type SheetRow } from '../../analysis/lab-sheet.js';
import { fail } from '../../errors/pondus-error.js';
import { runWithSheet } from './sheet-runner.js';
import { fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { splitTrailingValues } from '../../key-values/read-key-values.js';
import { takeJoinedNote } from '../input/key-value-args.js';
import type { Note } from '../../errors/issue.js';
import type { OutputOptions, RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { declareAnalysis } from './declarations.js';

export interface AnalysisCliOptions extends OutputOptions, RoundingOptions {
  found?: string;
  solvents?: string;
  tolerance?: string;
  step?: string;
  max?: string;
  top?: string;
  abbreviations?: boolean;
  sheet?: string;
  /** Rows of a lab sheet, keyed by their raw text (set by the command, not by the user). */
  sheetRows?: Record<string, SheetRow>;
  /** Notes for inputs whose found values came from separate arguments (set by the command). */
  joined?: Record<string, string>;
  /** The note when --found was joined with the arguments after it (set by the command). */
  foundNote?: string;
}

/** An argument made only of found values: `C=72.30`, `C=72.30,H=7.91`, `'C=72.30 H=7.91'`. */
const FOUND_ONLY = /^(?:\s*[A-Z][a-z]?\s*[=:]\s*[-+]?[0-9.]+\s*%?\s*[,;]?)+\s*$/;

/**
 * Arguments of `analysis` with found values typed unquoted (see {@link groupAnalysisArgs}).
 */
export interface AnalysisArgs {
  inputs: string[];
  found: string | undefined;
  joined: Record<string, string>;
  foundNote: string | undefined;
}

/**
 * Groups analysis arguments: a run of arguments made only of `El=value` pairs gives found values.
 * After a formula, they are that formula's (`C20H25N3O C=72.30 H=7.91`); with --found as well they
 * join it, when one formula is given (`--found C=72.30 H=7.91` typed unquoted) or when they come
 * before any formula; with several formulas and --found, where they belong is not known: refused.
 *
 * @example
 * groupAnalysisArgs(['C20H25N3O', 'H=7.91', 'N=12.60'], 'C=72.30').found // 'C=72.30 H=7.91 N=12.60'
 */
export function groupAnalysisArgs(args: string[], found: string | undefined): AnalysisArgs {
  const isFormula = (a: string) => a !== '-' && !FOUND_ONLY.test(a);
  const formulas = args.filter(isFormula).length;
  const inputs: string[] = [];
  const joined: Record<string, string> = Object.create(null);
  const toFound: string[] = [];
  for (let i = 0; i < args.length; ) {
    if (!FOUND_ONLY.test(args[i])) {
      inputs.push(args[i++]);
      continue;
    }
    const start = i;
    while (i < args.length && FOUND_ONLY.test(args[i])) i++;
    const run = args.slice(start, i).map((a) => a.trim());
    const prev = start > 0 ? args[start - 1] : null;
    if (prev !== null && isFormula(prev) && found === undefined) {
      const line = `${inputs.pop()}  ${run.join(' ')}`;
      inputs.push(line);
      joined[line] = `found values for ${prev} read from the argument${run.length === 1 ? '' : 's'} after it: ${run.join(' ')}`;
    } else if (found !== undefined && (formulas <= 1 || prev === null || !isFormula(prev))) {
      toFound.push(...run);
    } else if (found !== undefined) {
      throw fail({ code: 'USAGE', message: `${run.join(' ')}: found values after ${prev} and --found for several formulas; quote the --found values (--found 'C=72.30 H=7.91 N=12.60') or give each formula its own ('C20H25N3O C=72.30 H=7.91')` });
    } else {
      throw fail({ code: 'USAGE', message: `${run.join(' ')}: found values before any formula; put them after the formula, or use --found` });
    }
  }
  if (toFound.length === 0) return { inputs, found, joined, foundNote: undefined };
  const all = [found!, ...toFound].join(' ');
  const keys: string[] = all.match(/[A-Z][a-z]?(?=\s*[=:])/g) ?? [];
  const twice = keys.find((k, j) => keys.indexOf(k) !== j);
  if (twice) throw fail({ code: 'USAGE', message: `${twice} is given twice in --found ${found} and the arguments ${toFound.join(' ')}: quote the --found values` });
  return { inputs, found: all, joined, foundNote: `--found ${found} and the argument${toFound.length === 1 ? '' : 's'} ${toFound.join(' ')} were read as one set of found values (typed without quotes)` };
}

interface Row {
  result: AnalysisResult;
  id: string | null;
}

function numberOption(text: string | undefined, name: string): number | undefined {
  if (text === undefined) return undefined;
  const n = Number(text);
  if (!Number.isFinite(n) || n <= 0) throw fail({ code: 'USAGE', message: `--${name} takes a positive number, not '${text}'` });
  return n;
}

/** The presenter for `pondus analysis`. */
export function analysisPresenter(o: AnalysisCliOptions): Presenter<Row> {
  const opts = {
    abbreviations: !!o.abbreviations,
    tolerance: o.tolerance ?? '0.4',
    solvents: o.solvents ? o.solvents.split(',').map((s) => s.trim()).filter((s) => s !== '') : [],
    step: numberOption(o.step, 'step'),
    max: numberOption(o.max, 'max'),
    top: numberOption(o.top, 'top'),
    rounding: o.rounding ?? 'half-even',
  };
  if (opts.top !== undefined && !Number.isInteger(opts.top)) throw fail({ code: 'USAGE', message: `--top takes a whole number, not '${o.top}'` });
  if (opts.step !== undefined && opts.max !== undefined && (opts.step > opts.max || opts.max > 20 || opts.max / opts.step > 2000)) {
    throw fail({ code: 'USAGE', message: `--step ${o.step} and --max ${o.max} make no sensible grid: the step must not exceed the largest amount, --max at most 20, at most 2000 steps` });
  }
  if (o.found !== undefined && o.sheetRows !== undefined) throw fail({ code: 'USAGE', message: '--found and --sheet both give found values: the sheet has them per row; drop --found' });
  const withNotes = (result: AnalysisResult, extra: Note[]): AnalysisResult => (extra.length ? { ...result, notes: [...extra, ...result.notes] } : result);
  if (!/^[0-9]+(\.[0-9]+)?$/.test(opts.tolerance)) throw fail({ code: 'USAGE', message: `--tolerance takes a number of percentage points, not '${opts.tolerance}'` });
  if (Number(opts.tolerance) > 100) throw fail({ code: 'USAGE', message: `--tolerance ${opts.tolerance} is more than 100 percentage points` });
  const compute = (input: string): Row => {
    const sheetRow = o.sheetRows?.[input];
    if (sheetRow) {
      if (sheetRow.formula === '') throw fail({ code: 'BAD_RECORD', message: `row ${sheetRow.id || sheetRow.line} has no formula` }, input);
      if (sheetRow.problem) throw fail({ code: 'BAD_RECORD', message: `row ${sheetRow.id || sheetRow.line}: ${sheetRow.problem}` }, input);
      return { result: analysis(sheetRow.formula, sheetRow.found, opts), id: sheetRow.id };
    }
    const m = splitTrailingValues(input);
    if (m) {
      const extra: Note[] = [];
      const joined = takeJoinedNote(o.joined, input);
      if (joined) extra.push({ code: 'JOINED_ARGUMENTS', message: joined });
      if (o.found !== undefined) extra.push({ code: 'OWN_FOUND_VALUES', message: `this input gives its own found values (${m[1]}); --found is used only for inputs without them` });
      return { result: withNotes(analysis(m[0], m[1], opts), extra), id: null };
    }
    if (!o.found) throw fail({ code: 'USAGE', message: 'give the found values: --found C=72.30,H=7.91,N=12.60 (or after the formula on the line)' }, input);
    return { result: withNotes(analysis(input, o.found, opts), o.foundNote ? [{ code: 'JOINED_ARGUMENTS', message: o.foundNote }] : []), id: null };
  };
  const verdict = (r: AnalysisResult) => (r.pass ? 'passes' : 'fails');
  const sheet = o.sheetRows !== undefined;
  const listOf = (m: Record<string, number | string>) =>
    Object.entries(m).map(([s, v]) => `${s} ${typeof v === 'string' ? v : v.toFixed(2)}`).join(', ');
  // CSV: one column per element and quantity, for the elements analysed in practice (other elements stay in JSON, with a note)
  const CSV_ELEMENTS = ['C', 'H', 'N', 'S', 'O', 'P', 'F', 'Cl', 'Br', 'I'];
  const json = (row: Row) => Object.assign(analysisJson(row.result, row.id !== null ? { id: row.id } : {}), { rounding: opts.rounding });
  const roundingTail = `,"rounding":${JSON.stringify(opts.rounding)}`;
  return {
    compute,
    tally: sheet ? { count: (row) => row.result.pass, words: `compounds pass at ±${Number(opts.tolerance).toFixed(2)}` } : undefined,
    table: sheet
      ? {
          head: ['id', 'formula', 'calculated %', 'found %', 'largest deviation', 'verdict', 'best fit'],
          align: ['left', 'left', 'left', 'left', 'right', 'left', 'left'],
          row: ({ result: r, id }) => {
            const best = r.fits.find((f) => f.solvates.length > 0 && f.pass);
            return [id ?? '', r.formula, listOf(r.calculated), listOf(r.foundText), r.maxDeviation.toFixed(2), verdict(r), !r.pass && best ? `${best.formula} (${best.maxDeviation.toFixed(2)})` : ''];
          },
        }
      : undefined,
    json,
    // the same text as JSON.stringify(json(row)), written directly for the rows of a batch (a sheet's rows, with an id first, go the general way)
    jsonLine: (row) => (row.id === null ? analysisJsonLine(row.result, roundingTail) : JSON.stringify(json(row))),
    columns: ['input', 'id', 'formula', 'reportFormula', ...CSV_ELEMENTS.flatMap((e) => [`${e}_calculated`, `${e}_found`, `${e}_deviation`]), 'maxDeviation', 'pass', 'bestFit', 'bestFitMaxDeviation'],
    cells: ({ result: r, id }) => {
      const best = r.fits[0];
      const per = CSV_ELEMENTS.flatMap((e) => (e in r.found ? [r.calculated[e].toFixed(2), r.foundText[e], r.deviation[e].toFixed(2)] : ['', '', '']));
      return [r.input, id ?? '', r.formula, r.reportFormula, ...per, r.maxDeviation.toFixed(2), r.pass ? 'true' : 'false', best?.formula ?? '', best?.maxDeviation.toFixed(2) ?? ''];
    },
    block: sheet ? undefined : ({ result: r, id }) => {
      const rows = Object.keys(r.calculated).map((s) => {
        const d = r.deviation[s];
        return [s, r.calculated[s].toFixed(2), r.foundText[s], `${d < 0 ? '' : '+'}${d.toFixed(2)}`, r.within[s] ? 'ok' : 'off'];
      });
      const lines = [`${id ? `${id}: ` : ''}${r.reportFormula}${r.reportFormula !== r.formula ? `  (${r.formula})` : ''}   tolerance ±${r.tolerance.toFixed(2)}`];
      lines.push(fixedTable(['element', 'calculated %', 'found %', 'deviation', ''], rows, ['left', 'right', 'right', 'right', 'left']));
      lines.push(`verdict: ${verdict(r)} (largest deviation ${r.maxDeviation.toFixed(2)})`);
      lines.push(r.reportLine);
      if (r.fits.length > 0) {
        lines.push(`fits with solvates or salt partners, best first: ranked by the largest deviation plus ${PARTNER_PENALTY} per partner, so a fit with one partner more must be better by that much`);
        for (const f of r.fits) lines.push(`  ${f.formula.padEnd(40)} largest deviation ${f.maxDeviation.toFixed(2)}  ${f.pass ? 'passes' : 'fails'}`);
        const best = r.fits.find((f) => f.pass && f.solvates.length > 0);
        if (best && !r.pass) lines.push(`  ${best.reportLine}`);
        lines.push(`least-squares amounts: ${r.continuous.map((c) => `${c.amount.toFixed(2)} ${c.written} (largest deviation ${c.maxDeviation.toFixed(2)})`).join('; ')}`);
      }
      return lines.join('\n');
    },
    notes: ({ result: r }) => r.notes,
    noteItems: ({ result: r }) => {
      const outside = Object.keys(r.found).filter((e) => !CSV_ELEMENTS.includes(e));
      return outside.length ? [...r.notes, { code: 'CSV_ELEMENTS', message: `${outside.join(', ')} ha${outside.length === 1 ? 's' : 've'} no CSV columns (C, H, N, S, O, P, F, Cl, Br, I have); the JSON output carries every element` }] : r.notes;
    },
  };
}

/** Registers `pondus analysis`. */
export function registerAnalysis(program: Command, run: CommandRunner, stdin: () => AsyncIterable<string | Buffer>): void {
  declareAnalysis(program).action((args: string[], o: AnalysisCliOptions, cmd: Command) => {
    const given = (name: string) => cmd.getOptionValueSource(name) === 'cli';
    const unused = ['step', 'max', 'top'].filter(given);
    if (o.solvents === undefined && unused.length > 0) throw fail({ code: 'USAGE', message: `${unused.map((u) => `--${u}`).join(', ')} set${unused.length === 1 ? 's' : ''} the solvate search: give --solvents too, or drop ${unused.length === 1 ? 'it' : 'them'}` });
    if (o.sheet !== undefined) return runWithSheet(run, 'analysis', args, o, stdin, readSheet);
    const g = groupAnalysisArgs(args, o.found);
    if (g.found === undefined && g.inputs.length > 0 && g.inputs.every((f) => f !== '-' && !splitTrailingValues(f))) {
      throw fail({ code: 'USAGE', message: 'give the found values: --found C=72.30,H=7.91,N=12.60 (or after each formula)' });
    }
    const options: AnalysisCliOptions = { ...o, found: g.found, joined: g.joined, foundNote: g.foundNote };
    return run('analysis', g.inputs, options);
  });
}
