import type { Command } from 'commander';
import { fail } from '../../errors/pondus-error.js';
import { candidateFormulas, type CandidateResult } from '../../empirical/candidates.js';
import { combustion, PRODUCTS, type CombustionResult } from '../../empirical/combustion.js';
import { empirical, empiricalJson, type EmpiricalResult } from '../../empirical/empirical-formula.js';
import { readMeasurementSheet, type MeasurementRow } from '../../empirical/measurement-sheet.js';
import { runWithSheet } from './sheet-runner.js';
import { displayQuantity } from '../../sigfig/display-quantity.js';
import { fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { withOutputOptions, type OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';

const residualText = (m: Map<string, number>) => [...m].map(([s, r]) => `${s} ${r >= 0 ? '+' : ''}${r.toFixed(3)}`).join(', ');

// --- empirical ----------------------------------------------------------------

interface EmpiricalCliOptions extends OutputOptions {
  molarMass?: string;
  sheet?: string;
  /** Rows of a measurement sheet, keyed by their raw text (set by the command). */
  sheetRows?: Record<string, MeasurementRow>;
}

interface EmpiricalRow extends EmpiricalResult {
  id?: string;
}

/** The presenter for `pondus empirical`. */
export function empiricalPresenter(o: EmpiricalCliOptions): Presenter<EmpiricalRow> {
  return {
    compute: (input) => {
      const row = o.sheetRows?.[input];
      if (row) return { ...empirical(row.measurements, { molarMass: row.molarMass ?? o.molarMass }), id: row.id };
      return empirical(input, { molarMass: o.molarMass });
    },
    json: (r) => (r.id !== undefined ? { id: r.id, ...empiricalJson(r) } : empiricalJson(r)),
    columns: ['input', 'empirical', 'molecular', 'residuals', 'alternatives'],
    cells: (r) => [r.input, r.empirical, r.molecular ?? '', residualText(r.fit.residuals), r.alternatives.map((a) => a.formula).join(' ')],
    block: (r) => {
      const rows = [...r.percents].map(([s, p]) => [s, p.toFixed(3), `±${r.limits.get(s)!.toFixed(3)}`, (p + r.fit.residuals.get(s)!).toFixed(3), `${r.fit.residuals.get(s)! >= 0 ? '+' : ''}${r.fit.residuals.get(s)!.toFixed(3)}`]);
      const lines = [`${r.id ? `${r.id}: ` : ''}${r.input}`, `empirical formula: ${r.empirical}  (${r.empiricalMass.toFixed(3)} g/mol)`];
      if (r.molecular) lines.push(`molecular formula: ${r.molecular}  (× ${r.multiple})`);
      lines.push(fixedTable(['element', 'measured %', 'limit', 'calculated %', 'residual'], rows, ['left', 'right', 'right', 'right', 'right']));
      if (r.alternatives.length) lines.push(`also within the limits: ${r.alternatives.map((a) => `${a.formula} (${residualText(a.residuals)})`).join('; ')}`);
      return lines.join('\n');
    },
    notes: (r) => r.notes.map((n) => n.message),
  };
}

// --- combustion ---------------------------------------------------------------

type CombustionCliOptions = OutputOptions & Partial<Record<keyof typeof PRODUCTS, string>>;

/** The presenter for `pondus combustion`: inputs are sample masses. */
export function combustionPresenter(o: CombustionCliOptions): Presenter<CombustionResult> {
  const collected = Object.fromEntries(Object.keys(PRODUCTS).filter((k) => o[k as keyof typeof PRODUCTS] !== undefined).map((k) => [k, o[k as keyof typeof PRODUCTS]]));
  return {
    compute: (sample) => combustion({ sample, collected }),
    json: (r) => ({
      sample: displayQuantity(r.sample, 'g').text,
      elements: r.elements.map((e) => ({ symbol: e.symbol, mass: displayQuantity(e.mass, 'g').value.toNumber(), massDisplay: displayQuantity(e.mass, 'g').text, percent: e.percent.value.toNumber(), percentDisplay: displayQuantity(e.percent).figure, byDifference: e.byDifference })),
      empirical: r.empirical,
      residuals: Object.fromEntries(r.fit.residuals),
      alternatives: r.alternatives.map((a) => a.formula),
      notes: r.notes.map((n) => n.message),
    }),
    columns: ['sample', 'empirical', 'percents'],
    cells: (r) => [displayQuantity(r.sample, 'g').text, r.empirical, r.elements.map((e) => `${e.symbol}=${displayQuantity(e.percent).figure}`).join(' ')],
    block: (r) => {
      const rows = r.elements.map((e) => [e.symbol + (e.byDifference ? ' (by difference)' : ''), displayQuantity(e.mass, 'g').figure, displayQuantity(e.percent).figure]);
      return [`sample ${displayQuantity(r.sample, 'g').text}`, fixedTable(['element', 'mass g', 'mass %'], rows, ['left', 'right', 'right']), `empirical formula: ${r.empirical}`, ...(r.alternatives.length ? [`also within the limits: ${r.alternatives.map((a) => a.formula).join(', ')}`] : [])].join('\n');
    },
    notes: (r) => r.notes.map((n) => n.message),
  };
}

// --- candidates ---------------------------------------------------------------

interface CandidatesCliOptions extends OutputOptions {
  ppm?: string;
  found?: string;
  tolerance?: string;
  elements?: string;
  ratios?: boolean;
  limit?: string;
  molarMass?: boolean;
}

/** The presenter for `pondus candidates`: inputs are masses. */
export function candidatesPresenter(o: CandidatesCliOptions): Presenter<CandidateResult> {
  const num = (t: string | undefined, name: string) => {
    if (t === undefined) return undefined;
    const n = Number(t);
    if (!Number.isFinite(n) || n <= 0) throw fail({ code: 'USAGE', message: `--${name} takes a positive number, not '${t}'` });
    return n;
  };
  const opts = { ppm: num(o.ppm, 'ppm'), found: o.found, tolerance: num(o.tolerance, 'tolerance'), elements: o.elements, ratios: o.ratios !== false, limit: num(o.limit, 'limit') };
  return {
    compute: (mass) => candidateFormulas(o.molarMass ? { ...opts, molarMass: mass } : { ...opts, mass }),
    json: (r) => ({
      input: r.input,
      candidates: r.candidates.map((c) => ({ formula: c.formula, monoisotopicMass: c.monoisotopicMass, molarMass: c.molarMass, ppm: c.ppm, rdbe: c.rdbe, maxDeviation: c.maxDeviation })),
      examined: r.examined,
      truncated: r.truncated,
    }),
    columns: ['input', 'candidates'],
    cells: (r) => [r.input, r.candidates.map((c) => c.formula).join(' ')],
    block: (r) => {
      const rows = r.candidates.map((c, i) => [i + 1, c.formula, c.monoisotopicMass.toFixed(5), c.ppm === null ? '' : c.ppm.toFixed(2), c.rdbe, c.maxDeviation === null ? '' : c.maxDeviation.toFixed(2)]);
      const lines = [`${r.input}: ${r.candidates.length} candidate${r.candidates.length === 1 ? '' : 's'}${r.truncated ? ' shown (more fit: raise --limit)' : ''}, of ${r.examined} formulas in the window`];
      if (rows.length) lines.push(fixedTable(['#', 'formula', 'monoisotopic u', 'ppm', 'RDBE', 'max dev %'], rows, ['right', 'left', 'right', 'right', 'right', 'right']));
      return lines.join('\n');
    },
  };
}

/** Registers `pondus empirical`, `combustion` and `candidates`. */
export function registerEmpirical(program: Command, run: CommandRunner, stdin: () => AsyncIterable<string | Buffer>): void {
  withOutputOptions(
    program
      .command('empirical')
      .description('empirical (and molecular) formula from mass percents or element masses')
      .argument('[measurements...]', "'C=40.00 H=6.71 O=53.29', 'Fe=34.97 g O=15.03 g', 'C=40.00 H=6.71 O=rest'; - reads one set per line (or a JSON object per line)")
      .option('--molar-mass <M>', 'molar mass in g/mol (or a range such as 170-190) for the molecular formula')
      .option('--sheet <file>', "a CSV of measurements: element columns (C, H, N, …), optional id, 'sample' and 'molar mass' columns; - reads it from standard input"),
  ).action((inputs: string[], o: EmpiricalCliOptions) => runWithSheet(run, 'empirical', inputs, o, stdin, readMeasurementSheet));
  const combustionCmd = program
    .command('combustion')
    .description('combustion analysis: element percents and the empirical formula from the masses collected')
    .argument('[sample...]', "sample mass, e.g. '0.1000 g'");
  for (const [key, p] of Object.entries(PRODUCTS)) combustionCmd.option(`--${key} <mass>`, `mass of ${p.formula} collected (gives ${p.element})`);
  withOutputOptions(combustionCmd).action((inputs: string[], o: CombustionCliOptions) => run('combustion', inputs, o));
  withOutputOptions(
    program
      .command('candidates')
      .description('candidate formulas for an accurate mass and/or found percents, filtered for plausibility (RDBE, SENIOR, element ratios)')
      .argument('[masses...]', 'neutral monoisotopic masses in u (or molar masses with --molar-mass)')
      .option('--ppm <ppm>', 'mass tolerance in ppm', '5')
      .option('--molar-mass', 'the masses are average molar masses (window ±0.5 g/mol)')
      .option('--found <values>', 'found percents to match too: C=64.85,H=5.44,N=6.30')
      .option('--tolerance <points>', 'allowed |found − calculated| in percentage points', '0.4')
      .option('--elements <ranges>', 'element ranges', 'C0-80 H0-160 N0-10 O0-20 S0-4 P0-2 F0-6 Cl0-4 Br0-3 I0-2')
      .option('--no-ratios', 'do not apply the element-ratio limits')
      .option('--limit <n>', 'most candidates to list', '50'),
  ).action((inputs: string[], o: CandidatesCliOptions) => run('candidates', inputs, o));
}
