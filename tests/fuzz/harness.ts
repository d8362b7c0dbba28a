// The fuzz harness: generated inputs for every command, run through the CLI in a worker thread
// (stopped and replaced when an input hangs), each run checked against the batch contract.
import { parse as parseCsv } from 'csv-parse/sync';
import fc from 'fast-check';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import { anyText, equationText, expressionText, formulaText, hostileCell, ionSheet, jsonLine, keyValueSet, labSheet, measurementSheet, quantityText } from './generators.js';

export interface Case {
  command: string;
  args: string[];
  input?: string;
  /** For a sheet on standard input: how many rows it has (each gets one JSON line). */
  sheetRows?: number;
}

export interface Outcome {
  status: number;
  stdout: string;
  stderr: string;
  ms: number;
  hung?: boolean;
}

/** What a run may not do. Each kind is counted separately. */
export type Violation = 'hang' | 'slow' | 'bad-exit' | 'internal-error' | 'thrown' | 'stack-overflow' | 'bad-json' | 'bad-csv' | 'null-or-nan' | 'row-count' | 'control-in-table' | 'control-in-stderr' | 'formula-trigger';

const either = <T>(...a: fc.Arbitrary<T>[]) => fc.oneof(...a);
const formulaOrText = either(formulaText, formulaText, anyText, hostileCell);
const sheetFormat = fc.constantFrom('--json', '--csv', '--tsv', '--table');
const withFormat = (fmt: string) => (fmt === '--table' ? [] : [fmt]);

/** A command case for each command: arguments, or standard input with '-'. */
export const COMMANDS: Record<string, fc.Arbitrary<Case>> = {
  mass: fc.tuple(fc.array(formulaOrText, { minLength: 1, maxLength: 4 }), fc.constantFrom('--json', '--csv', '--table', '--abbreviations'), fc.boolean()).map(([xs, fmt, stdin]) => (stdin ? { command: 'mass', args: ['mass', fmt === '--table' ? '--json' : fmt, '-'], input: xs.join('\n') } : { command: 'mass', args: ['mass', ...(fmt === '--table' ? [] : [fmt]), '--', ...xs] })),
  composition: fc.tuple(formulaOrText, fc.constantFrom([], ['--part', 'H2O'], ['--part', 'SO4'], ['--mixture']), fc.constantFrom('--json', '--csv')).map(([x, extra, fmt]) => ({ command: 'composition', args: ['composition', fmt, ...extra, '--', x] })),
  calc: fc.tuple(either(expressionText, anyText), fc.constantFrom('--json', '--csv', '--explain')).map(([x, fmt]) => ({ command: 'calc', args: ['calc', fmt, '--', x] })),
  empirical: fc.tuple(either(keyValueSet, jsonLine, anyText), fc.boolean()).map(([x, stdin]) => (stdin ? { command: 'empirical', args: ['empirical', '--json', '-'], input: x } : { command: 'empirical', args: ['empirical', '--json', '--', x] })),
  analysis: fc.tuple(formulaOrText, either(keyValueSet, anyText), fc.constantFrom([], ['--solvents', 'water,DCM'], ['--solvents', 'THF', '--max', '1'])).map(([f, found, extra]) => ({ command: 'analysis', args: ['analysis', '--json', '--found', found, ...extra, '--', f] })),
  balance: either(equationText, anyText).map((x) => ({ command: 'balance', args: ['balance', '--json', '--', x] })),
  react: fc.tuple(equationText, fc.tuple(formulaText, quantityText)).map(([eq, [s, q]]) => ({ command: 'react', args: ['react', '--json', eq, '--amount', `${s}=${q}`] })),
  prepare: fc.tuple(formulaOrText, quantityText, quantityText, fc.option(quantityText, { nil: undefined })).map(([f, c, v, p]) => ({ command: 'prepare', args: ['prepare', '--json', f, '--concentration', c, '--volume', v, ...(p ? ['--purity', p] : [])] })),
  dilute: fc.tuple(quantityText, quantityText, quantityText).map(([a, b, v]) => ({ command: 'dilute', args: ['dilute', '--json', '--to', b, '--volume', v, '--', a] })),
  gravimetric: fc.tuple(formulaOrText, formulaOrText, fc.option(quantityText, { nil: undefined })).map(([a, w, m]) => ({ command: 'gravimetric', args: ['gravimetric', '--json', a, '--weighed', w, ...(m ? ['--mass', m] : [])] })),
  basis: fc.tuple(formulaOrText, formulaOrText, fc.option(quantityText, { nil: undefined })).map(([a, b, v]) => ({ command: 'basis', args: ['basis', '--json', a, '--to', b, ...(v ? ['--value', v] : [])] })),
  salt: fc.tuple(formulaOrText, formulaOrText, fc.option(quantityText, { nil: undefined })).map(([s, p, d]) => ({ command: 'salt', args: ['salt', '--json', s, '--parent', p, ...(d ? ['--dose', d] : [])] })),
  combustion: fc.tuple(quantityText, quantityText, quantityText).map(([s, c, h]) => ({ command: 'combustion', args: ['combustion', '--json', s, '--co2', c, '--h2o', h] })),
  ion: fc.tuple(formulaOrText, fc.constantFrom('[M+H]+', '[M+Na]+', '[M-H]-', '[M+2H]2+', '[2M+Na]+', 'M+•', '[M+H-H2O]+', '[M+Xx]+', '[M', '', '[M+H]3-'), fc.option(fc.constantFrom('242.1172', '1e309', '-5', 'x', '0'), { nil: undefined })).map(([f, a, found]) => ({ command: 'ion', args: ['ion', '--json', '--adduct', a, ...(found ? ['--found', found] : []), '--', f] })),
  pattern: fc.tuple(formulaOrText, fc.constantFrom([], ['--fine'], ['--resolution', '60000'], ['--resolution', '0'], ['--coverage', '99.99'], ['--adduct', '[M+H]+'])).map(([f, extra]) => ({ command: 'pattern', args: ['pattern', '--json', ...extra, '--', f] })),
  titration: fc.tuple(formulaOrText, quantityText, quantityText, quantityText, fc.option(quantityText, { nil: undefined })).map(([a, s, t, v, b]) => ({ command: 'titration', args: ['titration', '--json', a, '--sample', s, '--titrant', t, '--volume', v, ...(b ? ['--blank', b] : [])] })),
  standardise: fc.tuple(formulaOrText, quantityText, quantityText).map(([std, m, v]) => ({ command: 'standardise', args: ['standardise', '--json', std, '--mass', m, '--volume', v] })),
  'sample-basis': fc.tuple(quantityText, fc.constantFrom('dried', 'anhydrous', 'as-is', 'solvent-free', 'x'), quantityText).map(([v, to, c]) => ({ command: 'sample-basis', args: ['sample-basis', '--json', '--to', to, '--loss', c, '--water', c, '--', v] })),
  replicates: fc.array(fc.constantFrom(...['99.42', '99.61', '1e309', '-1', 'x', '%', '100', '']), { minLength: 0, maxLength: 8 }).map((xs) => ({ command: 'replicates', args: ['replicates', '--json', '-'], input: xs.join(' ') })),
  meq: fc.tuple(formulaOrText, fc.constantFrom('--mass', '--meq', '--mmol', '--concentration'), quantityText).map(([salt, opt, q]) => ({ command: 'meq', args: ['meq', '--json', salt, opt, q] })),
  osmolarity: keyValueSet.map((x) => ({ command: 'osmolarity', args: ['osmolarity', '--json', '--', x] })),
  alligation: fc.tuple(quantityText, quantityText, quantityText, quantityText).map(([t, h, l, total]) => ({ command: 'alligation', args: ['alligation', '--json', '--higher', h, '--lower', l, '--total', total, '--', t] })),
  'analysis --sheet': fc.tuple(labSheet, sheetFormat, fc.constantFrom([], ['--solvents', 'water'])).map(([sheet, fmt, extra]) => ({ command: 'analysis', args: ['analysis', ...withFormat(fmt), ...extra, '--sheet', '-'], input: sheet.text, sheetRows: sheet.rows })),
  'empirical --sheet': fc.tuple(measurementSheet, sheetFormat).map(([sheet, fmt]) => ({ command: 'empirical', args: ['empirical', ...withFormat(fmt), '--sheet', '-'], input: sheet.text, sheetRows: sheet.rows })),
  'ion --sheet': fc.tuple(ionSheet, sheetFormat).map(([sheet, fmt]) => ({ command: 'ion', args: ['ion', ...withFormat(fmt), '--sheet', '-'], input: sheet.text, sheetRows: sheet.rows })),
  'mass --csv': fc.tuple(fc.array(fc.oneof(hostileCell, formulaText), { minLength: 1, maxLength: 4 }), fc.constantFrom('--csv', '--tsv', '--table')).map(([xs, fmt]) => ({ command: 'mass', args: ['mass', ...withFormat(fmt), '--', ...xs] })),
  candidates: fc.tuple(fc.double({ min: -10, max: 1200, noNaN: true }), fc.constantFrom('1', '3', '10', '0', '-1', 'x')).map(([m, ppm]) => ({ command: 'candidates', args: ['candidates', '--json', String(Math.round(m * 1e5) / 1e5), '--ppm', ppm, '--limit', '20'] })),
};

/** Checks one run against the contract; returns what it broke. */
export function violations(c: Case, o: Outcome, slowMs: number): Violation[] {
  const v: Violation[] = [];
  if (o.hung) return ['hang'];
  if (o.ms > slowMs) v.push('slow');
  if (o.status === -1) v.push('thrown');
  else if (![0, 1, 2].includes(o.status)) v.push('bad-exit');
  if (/internal error|INTERNAL_ERROR/.test(o.stderr + o.stdout)) v.push('internal-error');
  // (the batch turns a stack overflow into 'too deeply nested to process': still an overflow)
  if (/Maximum call stack|RangeError|too deeply nested to process/.test(o.stderr + o.stdout)) v.push('stack-overflow');
  const json = c.args.includes('--json');
  if (json && o.stdout.trim() !== '') {
    const lines = o.stdout.split('\n').filter((l) => l.trim() !== '' && l.startsWith('{'));
    for (const l of lines) {
      try {
        const row = JSON.parse(l) as unknown;
        if (hasNullOrNaN(row, '', c.command)) v.push('null-or-nan');
      } catch {
        v.push('bad-json');
        break;
      }
    }
    if (c.input !== undefined && c.args.includes('-') && o.status !== 2) {
      const expected = c.sheetRows ?? c.input.replace(/(\r\n|\r|\n)$/, '').split(/\r\n|\r|\n/).length;
      if (lines.length !== expected) v.push('row-count');
    }
  }
  const csv = c.args.includes('--csv');
  const tsv = c.args.includes('--tsv');
  if ((csv || tsv) && o.stdout.trim() !== '') {
    try {
      const rows = parseCsv(o.stdout, { relax_column_count: true, delimiter: tsv ? '\t' : ',', quote: tsv ? false : '"' }) as string[][];
      if (rows.some((r) => r.some(isFormulaTrigger))) v.push('formula-trigger');
    } catch {
      v.push('bad-csv');
    }
  }
  // a table may hold no control character but line ends (CR would let a row overwrite itself)
  if (!json && !csv && !tsv && CONTROL.test(o.stdout)) v.push('control-in-table');
  // messages on stderr neither (tabs and line ends apart)
  if (CONTROL.test(o.stderr)) v.push('control-in-stderr');
  return [...new Set(v)];
}

/** The data rows of a CSV sheet (records after the header), as pondus reads them; -1 when it is not CSV. */
function sheetRowCount(text: string): number {
  try {
    return Math.max(0, (parseCsv(text.replace(/^\ufeff/, ''), { relax_column_count: true, skip_empty_lines: true }) as unknown[]).length - 1);
  } catch {
    return -1;
  }
}

/** C0 controls but tab and LF, DEL, C1 controls. */
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/;

/**
 * A cell a spreadsheet would run as a formula: starting with = + - @ tab or CR, unless the whole
 * cell is a plain number such as -0.39 or +1.5e3 (a cell like -2+3 is a formula).
 *
 * @example
 * isFormulaTrigger('-0.39') // false
 */
export function isFormulaTrigger(cell: string): boolean {
  return /^[=+@\t\r-]/.test(cell) && !/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(cell);
}

/**
 * A number JSON cannot carry (Infinity, NaN: written as null), or a calculator value that came out
 * null: elsewhere null is a documented "not applicable" (no molar mass given, an error without a
 * column, a nominal mass undefined for decimal counts).
 */
function hasNullOrNaN(x: unknown, key: string, command: string): boolean {
  if (x === null) return command === 'calc' && (key === 'value' || key === 'rounded');
  if (typeof x === 'number') return !Number.isFinite(x);
  if (Array.isArray(x)) return x.some((y) => hasNullOrNaN(y, key, command));
  if (typeof x === 'object') return Object.entries(x as object).some(([k, y]) => hasNullOrNaN(y, k, command));
  return false;
}

/** A worker running the CLI, replaced when a run takes longer than `hangMs`. */
export class CliWorker {
  private worker: Worker | null = null;
  private next = 0;

  constructor(private readonly hangMs: number) {}

  private start(): Worker {
    this.worker ??= new Worker(join(__dirname, '..', 'support', 'cli-worker.cjs'), { resourceLimits: { maxOldGenerationSizeMb: 1024, stackSizeMb: 4 } });
    return this.worker;
  }

  run(c: Case): Promise<Outcome> {
    const w = this.start();
    const id = this.next++;
    return new Promise((resolve) => {
      const timer = setTimeout(() => {
        w.removeAllListeners('message');
        void w.terminate();
        this.worker = null;
        resolve({ status: -1, stdout: '', stderr: '', ms: this.hangMs, hung: true });
      }, this.hangMs);
      const onError = (e: Error) => {
        clearTimeout(timer);
        this.worker = null;
        resolve({ status: -1, stdout: '', stderr: `worker died: ${e.message}`, ms: 0 });
      };
      w.once('error', onError);
      w.on('message', (m: Outcome & { id: number }) => {
        if (m.id !== id) return;
        clearTimeout(timer);
        w.removeAllListeners('message');
        w.off('error', onError);
        resolve(m);
      });
      w.postMessage({ id, args: c.args, input: c.input ?? '' });
    });
  }

  /**
   * Runs cases in order as {@link run} does, but sends them to the worker at once, which answers each
   * as it ends: no round trip between two cases. A case is a hang when its answer has not come
   * `hangMs` after the one before it (or after the start); the worker is then replaced and the
   * cases after it are sent to the new one.
   */
  async runAll(cases: Case[], onOutcome: (c: Case, o: Outcome) => void): Promise<void> {
    let from = 0;
    while (from < cases.length) {
      const w = this.start();
      const first = this.next;
      const batch = cases.slice(from).map((c, i) => ({ id: first + i, args: c.args, input: c.input ?? '' }));
      this.next += batch.length;
      from = await new Promise<number>((resolve) => {
        let done = from;
        let timer: NodeJS.Timeout;
        const finish = (at: number) => {
          clearTimeout(timer);
          w.removeAllListeners('message');
          w.off('error', onError);
          resolve(at);
        };
        const arm = () => {
          clearTimeout(timer);
          timer = setTimeout(() => {
            void w.terminate();
            this.worker = null;
            onOutcome(cases[done], { status: -1, stdout: '', stderr: '', ms: this.hangMs, hung: true });
            finish(done + 1);
          }, this.hangMs);
        };
        const onError = (e: Error) => {
          this.worker = null;
          onOutcome(cases[done], { status: -1, stdout: '', stderr: `worker died: ${e.message}`, ms: 0 });
          finish(done + 1);
        };
        w.once('error', onError);
        w.on('message', (m: Outcome & { id: number }) => {
          if (m.id !== first + (done - from)) return;
          onOutcome(cases[done], m);
          done++;
          if (done === cases.length) finish(done);
          else arm();
        });
        arm();
        w.postMessage({ batch });
      });
    }
  }

  async close(): Promise<void> {
    if (this.worker) await this.worker.terminate();
    this.worker = null;
  }
}

export interface FuzzReport {
  runs: number;
  /** Wall time of the whole run. */
  ms: number;
  counts: Partial<Record<Violation, number>>;
  examples: { violation: Violation; case: Case; stderr: string }[];
}

/** Runs `runsPerCommand` generated cases for each command and counts the violations. */
export async function fuzz(options: { seed: number; runsPerCommand: number; slowMs: number; hangMs: number; commands?: string[] }): Promise<FuzzReport> {
  const worker = new CliWorker(options.hangMs);
  const report: FuzzReport = { runs: 0, ms: 0, counts: {}, examples: [] };
  const t0 = performance.now();
  try {
    for (const [name, arb] of Object.entries(COMMANDS)) {
      if (options.commands && !options.commands.includes(name)) continue;
      const runs = name === 'candidates' ? Math.max(1, Math.round(options.runsPerCommand / 20)) : options.runsPerCommand;
      const cases = fc.sample(arb, { seed: options.seed + name.length * 7919, numRuns: runs });
      await worker.runAll(cases, (c, o) => {
        report.runs++;
        for (const v of violations(c, o, options.slowMs)) {
          report.counts[v] = (report.counts[v] ?? 0) + 1;
          if (report.examples.filter((e) => e.violation === v).length < 5) report.examples.push({ violation: v, case: c, stderr: o.stderr.slice(0, 300) });
        }
      });
    }
  } finally {
    await worker.close();
  }
  report.ms = Math.round(performance.now() - t0);
  return report;
}

/**
 * A smaller case that still shows the violation: drops arguments, lines and characters of each
 * text while the violation stays (at most `budget` runs).
 *
 * @example
 * await shrinkCase(worker, { command: 'mass', args: ['mass', '--json', '--', 'H2Oxx'] }, 'internal-error')
 */
export async function shrinkCase(worker: CliWorker, c: Case, kind: Violation, budget = 300): Promise<Case> {
  let best = c;
  let left = budget;
  const still = async (k: Case) => {
    left--;
    return violations(k, await worker.run(k), 6000).includes(kind);
  };
  // the texts that may shrink: the arguments after the command's options ('--' onwards), and the input
  const texts = (k: Case): { get: () => string; set: (s: string) => Case }[] => {
    const out: { get: () => string; set: (s: string) => Case }[] = [];
    k.args.forEach((a, i) => {
      if (i === 0 || a.startsWith('--') || a === '-') return;
      out.push({ get: () => a, set: (s) => ({ ...k, args: k.args.map((x, j) => (j === i ? s : x)) }) });
    });
    if (k.input !== undefined && k.sheetRows === undefined) out.push({ get: () => k.input!, set: (s) => ({ ...k, input: s }) });
    // a sheet shrinks too, its row count read again (not for a wrong row count: that needs the count)
    if (k.input !== undefined && k.sheetRows !== undefined && kind !== 'row-count') out.push({ get: () => k.input!, set: (s) => ({ ...k, input: s, sheetRows: sheetRowCount(s) }) });
    return out;
  };
  let progress = true;
  while (progress && left > 0) {
    progress = false;
    for (const [i] of texts(best).entries()) {
      let chunk = Math.max(1, texts(best)[i].get().length >> 1);
      while (chunk >= 1 && left > 0) {
        let cut = false;
        const s = texts(best)[i].get();
        for (let at = 0; at + chunk <= s.length && left > 0; at += chunk) {
          const k = texts(best)[i].set(s.slice(0, at) + s.slice(at + chunk));
          if (await still(k)) {
            best = k;
            cut = progress = true;
            break;
          }
        }
        if (!cut) chunk >>= 1;
      }
    }
  }
  return best;
}
