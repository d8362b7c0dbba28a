import { Option, type Command } from 'commander';
import { analysis, type AnalysisResult } from '../../analysis/check.js';
import { analysisJson } from '../../analysis/analysis-json.js';
import { readSheet, type SheetRow } from '../../analysis/lab-sheet.js';
import { fail } from '../../errors/pondus-error.js';
import { runWithSheet } from './sheet-runner.js';
import { fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { withOutputOptions, type OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';

export interface AnalysisCliOptions extends OutputOptions {
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
}

/** A line of batch input: `FORMULA` alone, or `FORMULA  C=72.30 H=7.91 N=12.60`. */
const WITH_FOUND = /^(.*?)[\s;]+((?:[A-Z][a-z]?\s*=\s*[0-9.]+%?[\s,;]*)+)$/;

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
  };
  if (!/^[0-9]+(\.[0-9]+)?$/.test(opts.tolerance)) throw fail({ code: 'USAGE', message: `--tolerance takes a number of percentage points, not '${opts.tolerance}'` });
  const compute = (input: string): Row => {
    const sheetRow = o.sheetRows?.[input];
    if (sheetRow) {
      if (sheetRow.formula === '') throw fail({ code: 'BAD_RECORD', message: `row ${sheetRow.id || sheetRow.line} has no formula` }, input);
      return { result: analysis(sheetRow.formula, sheetRow.found, opts), id: sheetRow.id };
    }
    const m = WITH_FOUND.exec(input.trim());
    if (m) return { result: analysis(m[1].trim(), m[2], opts), id: null };
    if (!o.found) throw fail({ code: 'USAGE', message: 'give the found values: --found C=72.30,H=7.91,N=12.60 (or after the formula on the line)' }, input);
    return { result: analysis(input, o.found, opts), id: null };
  };
  const verdict = (r: AnalysisResult) => (r.pass ? 'passes' : 'fails');
  const sheet = o.sheetRows !== undefined;
  const listOf = (m: Map<string, { toFixed(n: number): string }> | Map<string, string>) =>
    [...m].map(([s, v]) => `${s} ${typeof v === 'string' ? v : v.toFixed(2)}`).join(', ');
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
    json: (row) => analysisJson(row.result, row.id !== null ? { id: row.id } : {}),
    columns: ['input', 'id', 'formula', 'calculated', 'found', 'maxDeviation', 'pass', 'bestFit', 'bestFitMaxDeviation'],
    cells: ({ result: r, id }) => {
      const list = (m: Map<string, { toFixed(n: number): string }>) => [...m].map(([s, v]) => `${s}=${v.toFixed(2)}`).join(' ');
      const best = r.fits[0];
      return [r.input, id ?? '', r.formula, list(r.calculated), [...r.foundText].map(([s, v]) => `${s}=${v}`).join(' '), r.maxDeviation.toFixed(2), r.pass ? 'true' : 'false', best?.formula ?? '', best?.maxDeviation.toFixed(2) ?? ''];
    },
    block: sheet ? undefined : ({ result: r, id }) => {
      const rows = [...r.calculated.keys()].map((s) => {
        const d = r.deviation.get(s)!;
        const ok = d.abs().lte(r.tolerance);
        return [s, r.calculated.get(s)!.toFixed(2), r.foundText.get(s)!, `${d.isNegative() ? '' : '+'}${d.toFixed(2)}`, ok ? 'ok' : 'off'];
      });
      const lines = [`${id ? `${id}: ` : ''}${r.formula}   tolerance ±${r.tolerance.toFixed(2)}`];
      lines.push(fixedTable(['element', 'calculated %', 'found %', 'deviation', ''], rows, ['left', 'right', 'right', 'right', 'left']));
      lines.push(`verdict: ${verdict(r)} (largest deviation ${r.maxDeviation.toFixed(2)})`);
      lines.push(r.reportLine);
      if (r.fits.length > 0) {
        lines.push('fits with solvates or salt partners, best first:');
        for (const f of r.fits) lines.push(`  ${f.formula.padEnd(40)} largest deviation ${f.maxDeviation.toFixed(2)}  ${f.pass ? 'passes' : 'fails'}`);
        const best = r.fits.find((f) => f.pass && f.solvates.length > 0);
        if (best && !r.pass) lines.push(`  ${best.reportLine}`);
        lines.push(`least-squares amounts: ${r.continuous.map((c) => `${c.amount.toFixed(2)} ${c.formula} (largest deviation ${c.maxDeviation.toFixed(2)})`).join('; ')}`);
      }
      return lines.join('\n');
    },
    notes: ({ result: r }) => r.notes.map((n) => n.message),
  };
}

/** Registers `pondus analysis`. */
export function registerAnalysis(program: Command, run: CommandRunner, stdin: () => AsyncIterable<string | Buffer>): void {
  withOutputOptions(
    program
      .command('analysis')
      .description('elemental analysis: calculated vs found, verdict at a tolerance, solvate fits, the report line')
      .argument('[formulas...]', "formulas; - reads one per line ('FORMULA' or 'FORMULA C=… H=… N=…')")
      .option('--found <values>', 'found mass percents, e.g. C=72.30,H=7.91,N=12.60')
      .option('--solvents <list>', 'solvents and salt partners to fit: water,DCM,CHCl3,MeOH,EtOH,EtOAc,ether,THF,acetone,MeCN,DMF,DMSO,toluene,hexane,HCl,TFA,… or formulas')
      .option('--tolerance <points>', 'allowed |found − calculated| in percentage points', '0.4')
      .option('--step <amount>', 'step of the solvate amounts searched', '0.05')
      .option('--max <amount>', 'largest amount of each solvate searched', '2')
      .option('--top <n>', 'how many fits to list', '5')
      .option('--abbreviations', 'read group abbreviations (Me, Et, Ph, Boc, …) in formulas')
      .addOption(new Option('--sheet <file>', 'a lab sheet (CSV: id, formula, and found % in columns C, H, N, S, …); - reads it from standard input')),
  ).action((formulas: string[], o: AnalysisCliOptions) => {
    if (o.found === undefined && o.sheet === undefined && formulas.length > 0 && formulas.every((f) => f !== '-' && !WITH_FOUND.test(f.trim()))) {
      throw fail({ code: 'USAGE', message: 'give the found values: --found C=72.30,H=7.91,N=12.60 (or after each formula)' });
    }
    return runWithSheet(run, 'analysis', formulas, o, stdin, readSheet);
  });
}
