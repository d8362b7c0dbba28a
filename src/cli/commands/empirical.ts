import { keysFirst } from '../../exact/json-row.js';
import type { Command } from 'commander';
import { checkRun, joinPairArgs, joinedNote, joinUnitWords, pairRuns, takeJoinedNote } from '../input/key-value-args.js';
import { fail } from '../../errors/pondus-error.js';
import { candidateFormulas, DEFAULT_RANGES, MAX_LIMIT, readRanges, type CandidateResult } from '../../empirical/candidates.js';
import { candidatesJson } from '../../empirical/candidates-json.js';
import { readIonNotation } from '../../ions/read-ion-notation.js';
import { readPeaks } from '../../empirical/pattern-match.js';
import { readFound } from '../../analysis/found-values.js';
import { PondusError } from '../../errors/pondus-error.js';
import { combustion, combustionJson, PRODUCTS, type CombustionResult } from '../../empirical/combustion.js';
import { empirical, empiricalJson, molarMassForm, type EmpiricalResult } from '../../empirical/empirical-formula.js';
import { readMeasurementSheet, type MeasurementRow } from '../../empirical/measurement-sheet.js';
import { runWithSheet } from './sheet-runner.js';
import { hillOrder } from '../../formula/hill.js';
import { fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { roundingOf, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { declareEmpirical } from './declarations.js';

const residualText = (m: Record<string, number>) => Object.entries(m).map(([s, r]) => `${s} ${r >= 0 ? '+' : ''}${r.toFixed(3)}`).join(', ');

/** Runs a check of an option; its PondusError becomes a usage error (exit 2) with the same message. */
function usage(check: () => unknown): void {
  try {
    check();
  } catch (e) {
    if (e instanceof PondusError) throw fail({ code: 'USAGE', message: e.first.message, options: e.first.options });
    throw e;
  }
}

// --- empirical ----------------------------------------------------------------

interface EmpiricalCliOptions extends OutputOptions {
  molarMass?: string;
  tolerance?: string;
  sheet?: string;
  /** Inputs joined from single KEY=VALUE arguments, with the note saying so (set by the command). */
  joined?: Record<string, string>;
  /** Rows of a measurement sheet, keyed by their raw text (set by the command). */
  sheetRows?: Record<string, MeasurementRow>;
}

interface EmpiricalRow extends EmpiricalResult {
  id?: string;
}

/** The presenter for `pondus empirical`. */
export function empiricalPresenter(o: EmpiricalCliOptions): Presenter<EmpiricalRow> {
  const form = o.molarMass === undefined ? undefined : molarMassForm(o.molarMass);
  if (form === null) {
    const shown = o.molarMass!.length > 40 ? `${o.molarMass!.slice(0, 40)}…` : o.molarMass;
    throw fail({ code: 'USAGE', message: `--molar-mass takes a number of g/mol or a range such as 170-190, not '${shown}'` });
  }
  if (form?.kind === 'range' && !(Number(form.lo) > 0 && Number(form.lo) < Number(form.hi))) throw fail({ code: 'USAGE', message: `--molar-mass ${o.molarMass}: a range goes from the lower to the higher molar mass, both above zero` });
  if (o.molarMass !== undefined && form?.kind === 'value' && !(parseFloat(o.molarMass) > 0)) throw fail({ code: 'USAGE', message: 'the molar mass must be positive' });
  if (o.molarMass !== undefined && o.sheetRows && Object.values(o.sheetRows).some((r) => r.molarMass !== undefined)) {
    throw fail({ code: 'USAGE', message: "the sheet has a molar-mass column and --molar-mass was given too: use one (the column for each row, or --molar-mass for all)" });
  }
  const tolerance = o.tolerance === undefined ? undefined : Number(o.tolerance);
  if (tolerance !== undefined && !(tolerance > 0 && tolerance <= 5)) throw fail({ code: 'USAGE', message: `--tolerance takes a number of percentage points above 0 and at most 5, not '${o.tolerance}'` });
  return {
    compute: (input) => {
      const row = o.sheetRows?.[input];
      if (row) return { ...empirical(row.measurements, { molarMass: row.molarMass ?? o.molarMass, tolerance }), id: row.id };
      const r = empirical(input, { molarMass: o.molarMass, tolerance });
      const joined = takeJoinedNote(o.joined, input);
      if (joined) r.notes.unshift({ code: 'JOINED_ARGUMENTS', message: joined });
      return r;
    },
    json: (r) => (r.id !== undefined ? keysFirst({ id: r.id }, empiricalJson(r)) : empiricalJson(r)),
    columns: ['input', 'id', 'empirical', 'molecular', 'multiple', 'empiricalMass', 'largestResidual', 'alternative_1', 'alternative_2', 'alternative_3'],
    cells: (r) => {
      const largest = Object.values(r.fit.residuals).reduce((a, x) => (Math.abs(x) > Math.abs(a) ? x : a), 0);
      return [r.input, r.id ?? '', r.empirical, r.molecular ?? '', r.multiple ?? '', r.empiricalMass, largest, r.alternatives[0]?.formula ?? '', r.alternatives[1]?.formula ?? '', r.alternatives[2]?.formula ?? ''];
    },
    block: (r) => {
      const sign = (x: number) => `${x >= 0 ? '+' : ''}${x.toFixed(3)}`;
      const rows = hillOrder(Object.keys(r.percents)).map((s) => [s + (s === r.byDifference ? ' (by difference)' : ''), r.percents[s].toFixed(3), `±${r.limits[s].toFixed(3)}`, (r.percents[s] + r.fit.residuals[s]).toFixed(3), sign(r.fit.residuals[s])]);
      const lines = [`${r.id ? `${r.id}: ` : ''}${r.input}`, `empirical formula: ${r.empirical}  (${r.empiricalMass.toFixed(3)} g/mol)`];
      if (r.molecular) lines.push(`molecular formula: ${r.molecular}  (× ${r.multiple})`);
      lines.push(fixedTable(['element', 'measured %', 'limit', 'calculated %', 'residual'], rows, ['left', 'right', 'right', 'right', 'right']));
      if (r.alternatives.length) lines.push(`also within the limits: ${r.alternatives.map((a) => `${a.formula} (${residualText(a.residuals)})`).join('; ')}`);
      return lines.join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => r.notes,
  };
}

// --- combustion ---------------------------------------------------------------

type CombustionCliOptions = OutputOptions & RoundingOptions & Partial<Record<keyof typeof PRODUCTS, string>> & {
  /** Set by the command: the note when units typed as separate words were joined. */
  unitNote?: string;
};

/** The presenter for `pondus combustion`: inputs are sample masses. */
export function combustionPresenter(o: CombustionCliOptions): Presenter<CombustionResult> {
  const collected = Object.fromEntries(Object.keys(PRODUCTS).filter((k) => o[k as keyof typeof PRODUCTS] !== undefined).map((k) => [k, o[k as keyof typeof PRODUCTS]]));
  if (Object.keys(collected).length === 0) throw fail({ code: 'USAGE', message: `give the masses collected: --co2 (and --h2o, ${Object.keys(PRODUCTS).filter((k) => k !== 'co2' && k !== 'h2o').map((k) => `--${k}`).join(', ')})` });
  if (collected.co2 === undefined) throw fail({ code: 'USAGE', message: 'give the mass of CO2 collected (--co2): the carbon of the sample' });
  const rounding = roundingOf(o);
  // one mass and one percent column per element collected, and O (by difference) last
  const csvElements = [...Object.keys(collected).map((k) => PRODUCTS[k].element), 'O'];
  return {
    compute: (sample) => {
      const r = combustion({ sample, collected, rounding });
      if (o.unitNote) r.notes.unshift({ code: 'JOINED_ARGUMENTS', message: o.unitNote });
      return r;
    },
    json: (r) => combustionJson(r),
    noteItems: (r) => r.notes,
    columns: ['input', 'sample', 'empirical', ...csvElements.flatMap((e) => [`${e}_mass_g`, `${e}_percent`])],
    cells: (r) => [
      r.input,
      r.sample,
      r.empirical ?? '',
      ...csvElements.flatMap((s) => {
        const e = r.elements.find((x) => x.symbol === s);
        return e ? [e.massFigure, e.percentFigure] : ['', ''];
      }),
    ],
    block: (r) => {
      const rows = r.elements.map((e) => [e.symbol + (e.byDifference ? ' (by difference)' : ''), e.massFigure, e.percentFigure]);
      return [`sample ${r.sample}`, fixedTable(['element', 'mass g', 'mass %'], rows, ['left', 'right', 'right']), `empirical formula: ${r.empirical ?? 'none within the limits of the data (see the note)'}`, ...(r.alternatives.length ? [`also within the limits: ${r.alternatives.map((a) => a.formula).join(', ')}`] : [])].join('\n');
    },
    notes: (r) => r.notes,
  };
}

// --- candidates ---------------------------------------------------------------

interface CandidatesCliOptions extends OutputOptions {
  ppm?: string;
  ion?: string;
  pattern?: string;
  found?: string;
  tolerance?: string;
  elements?: string;
  /** 'extended' (default), 'common', 'none', or false from --no-ratios. */
  ratios?: string | boolean;
  limit?: string;
  molarMass?: boolean;
  /** Set by the command: the note when found values came from several arguments. */
  foundNote?: string;
}

const RATIO_SETTINGS = ['extended', 'common', 'none'] as const;

/** Progress of a long search on stderr, on a terminal only, once it has run about a second. */
function progressLine(): { onProgress?: (done: number) => void; end(): void } {
  if (!process.stderr.isTTY) return { end: () => undefined };
  const start = Date.now();
  let shown = false;
  return {
    onProgress: (done) => {
      if (Date.now() - start < 1000) return;
      shown = true;
      process.stderr.write(`\rcandidates: searching… ${Math.floor(done * 100)} %`);
    },
    end: () => {
      if (shown) process.stderr.write('\r\x1b[K');
    },
  };
}

/** The presenter for `pondus candidates`: inputs are masses (or m/z values with --ion). */
export function candidatesPresenter(o: CandidatesCliOptions): Presenter<CandidateResult> {
  const num = (t: string | undefined, name: string) => {
    if (t === undefined) return undefined;
    const n = Number(t);
    if (!Number.isFinite(n) || n <= 0) throw fail({ code: 'USAGE', message: `--${name} takes a positive number, not '${t}'` });
    return n;
  };
  const ratios = o.ratios === false ? 'none' : o.ratios === undefined || o.ratios === true ? 'extended' : o.ratios;
  if (!(RATIO_SETTINGS as readonly string[]).includes(ratios)) throw fail({ code: 'USAGE', message: `--ratios takes extended, common or none, not '${ratios}'` });
  const opts = {
    ppm: num(o.ppm, 'ppm'),
    ion: o.ion,
    pattern: o.pattern,
    found: o.found,
    tolerance: num(o.tolerance, 'tolerance'),
    elements: o.elements,
    ratios: ratios as (typeof RATIO_SETTINGS)[number],
    limit: num(o.limit, 'limit'),
  };
  if (opts.ppm !== undefined && opts.ppm > 1000) throw fail({ code: 'USAGE', message: `--ppm ${o.ppm} is too wide a window: at most 1000 ppm` });
  if (opts.limit !== undefined && (!Number.isInteger(opts.limit) || opts.limit > MAX_LIMIT)) throw fail({ code: 'USAGE', message: `--limit takes a whole number up to ${MAX_LIMIT}, not '${o.limit}'` });
  // options read once, before any input: a bad range, ion or found value is a usage error
  usage(() => readRanges(opts.elements ?? DEFAULT_RANGES));
  if (opts.ion !== undefined) usage(() => readIonNotation(opts.ion!));
  if (opts.found !== undefined) usage(() => readFound(opts.found!));
  if (opts.pattern !== undefined) usage(() => readPeaks(opts.pattern!));
  const limit = opts.limit ?? 50;
  const withPattern = opts.pattern !== undefined;
  const withIon = opts.ion !== undefined;
  const withFound = opts.found !== undefined;
  const perCandidate = ['formula', ...(withIon ? ['mz'] : []), 'ppm', ...(withFound ? ['maxDeviation'] : []), ...(withPattern ? ['patternSimilarity'] : []), 'score'];
  const columns = ['input', 'ion', 'ratios', 'plausible', 'truncated'];
  for (let k = 1; k <= limit; k++) for (const c of perCandidate) columns.push(`${c}_${k}`);
  return {
    compute: (mass) => {
      const progress = progressLine();
      try {
        const r = candidateFormulas(o.molarMass ? { ...opts, molarMass: mass, onProgress: progress.onProgress } : { ...opts, mass, onProgress: progress.onProgress });
        if (o.foundNote) r.notes.unshift({ code: 'JOINED_ARGUMENTS', message: o.foundNote });
        return r;
      } finally {
        progress.end();
      }
    },
    json: (r) => candidatesJson(r),
    notes: (r) => r.notes,
    noteItems: (r) => r.notes,
    columns,
    cells: (r) => {
      const cells: (string | number)[] = [r.input, r.ion ?? '', r.ratios, r.plausible, r.truncated ? 'true' : 'false'];
      for (let k = 0; k < limit; k++) {
        const c = r.candidates[k];
        if (!c) {
          for (let j = 0; j < perCandidate.length; j++) cells.push('');
          continue;
        }
        cells.push(c.formula);
        if (withIon) cells.push(c.mz ?? '');
        cells.push(c.ppm ?? '');
        if (withFound) cells.push(c.maxDeviation ?? '');
        if (withPattern) cells.push(c.patternSimilarity ?? '');
        cells.push(c.score);
      }
      return cells;
    },
    block: (r) => {
      const fixed = (x: number | null, d: number) => (x === null ? '' : x.toFixed(d));
      const rows = r.candidates.map((c, i) => [
        i + 1,
        c.formula,
        ...(r.ion ? [c.ionFormula ?? '', fixed(c.mz, 5)] : [fixed(c.monoisotopicMass, 5)]),
        c.ppm === null ? fixed(c.molarMass, 3) : `${c.ppm >= 0 ? '+' : ''}${c.ppm.toFixed(2)}`,
        c.rdbe === null ? '–' : c.rdbe,
        ...(withFound ? [fixed(c.maxDeviation, 2)] : []),
        ...(withPattern ? [fixed(c.patternSimilarity, 3)] : []),
        c.score.toFixed(3),
      ]);
      const lines = [`${r.search}: ${r.candidates.length} candidate${r.candidates.length === 1 ? '' : 's'}${r.truncated ? ` shown of ${r.plausible} (raise --limit for more)` : ''}; ${r.examined} formulas in the window, ${r.ratios === 'none' ? 'no element-ratio limits' : `${r.ratios} element-ratio limits`}`];
      const head = ['#', 'formula', ...(r.ion ? ['ion', 'm/z'] : ['monoisotopic u']), r.candidates[0]?.ppm === null ? 'molar mass' : 'ppm', 'RDBE', ...(withFound ? ['max dev %'] : []), ...(withPattern ? ['pattern'] : []), 'score'];
      if (rows.length) lines.push(fixedTable(head, rows, head.map((_, i) => (i === 1 || (r.ion && i === 2) ? 'left' : 'right'))));
      return lines.join('\n');
    },
  };
}

/** Registers `pondus empirical`, `combustion` and `candidates` (or the one named by `only`). */
export function registerEmpirical(program: Command, run: CommandRunner, stdin: () => AsyncIterable<string | Buffer>, only?: string): void {
  if (only === undefined || only === 'empirical') registerEmpiricalCommand(program, run, stdin);
  if (only === undefined || only === 'combustion') registerCombustion(program, run);
  if (only === undefined || only === 'candidates') registerCandidates(program, run);
}

/** Registers `pondus empirical` alone: its bundle holds none of the other two commands' code. */
export function registerEmpiricalCommand(program: Command, run: CommandRunner, stdin: () => AsyncIterable<string | Buffer>): void {
  declareEmpirical(program, 'empirical').empirical?.action((inputs: string[], o: EmpiricalCliOptions) => {
    if (o.sheet !== undefined) return runWithSheet(run, 'empirical', inputs, o, stdin, readMeasurementSheet);
    const { inputs: sets, joined } = joinPairArgs(inputs, { what: 'measurement set', units: true });
    const options: EmpiricalCliOptions = { ...o, joined };
    return run('empirical', sets, options);
  });
}

/** Registers `pondus combustion` alone. */
export function registerCombustion(program: Command, run: CommandRunner): void {
  declareEmpirical(program, 'combustion').combustion?.action((inputs: string[], o: CombustionCliOptions, cmd: Command) => {
    // masses typed without quotes: `0.1000 g --co2 0.2000 g` leaves the units among the samples
    if (inputs.some((a) => /^[A-Za-zµμ]+$/.test(a))) {
      const raw = (cmd.parent as (Command & { rawArgs?: string[] }) | null)?.rawArgs ?? [];
      const re = joinUnitWords(raw, 'combustion', new Set(Object.keys(PRODUCTS)));
      if (re && re.joined.length > 0 && !re.positionals.some((a) => /^[A-Za-zµμ]+$/.test(a))) {
        const options = { ...o, ...re.values, unitNote: `units typed as separate words were joined to their numbers: ${re.joined.join('; ')}` } as CombustionCliOptions;
        return run('combustion', re.positionals, options);
      }
      throw fail({ code: 'USAGE', message: "a unit stands alone among the sample masses: quote each mass with its unit, e.g. combustion '0.1000 g' --co2 '0.2000 g'" });
    }
    return run('combustion', inputs, o);
  });
}

/** Registers `pondus candidates` alone. */
export function registerCandidates(program: Command, run: CommandRunner): void {
  declareEmpirical(program, 'candidates').candidates?.action((inputs: string[], o: CandidatesCliOptions, cmd: Command) => {
    const given = (name: string) => cmd.getOptionValueSource(name) === 'cli';
    if (o.found === undefined && given('tolerance')) throw fail({ code: 'USAGE', message: '--tolerance applies to found percents: give --found too, or drop --tolerance' });
    // found values typed unquoted: --found C=40.00 H=6.71 leaves H=6.71 among the masses
    if (inputs.length === 0 && o.found !== undefined) throw fail({ code: 'USAGE', message: "--found checks candidates near a mass: give the accurate mass or m/z (or --molar-mass); for a formula from found percents alone, use pondus empirical 'C=40.00 H=6.71 O=rest'" });
    const runs = pairRuns(inputs, false);
    if (runs.length > 0) {
      if (o.found === undefined) throw fail({ code: 'USAGE', message: `${runs[0].pairs.join(' ')}: found percents go with --found, e.g. --found 'C=40.00 H=6.71'` });
      if (runs.length > 1) throw fail({ code: 'USAGE', message: `found values are scattered among the masses (${runs.map((r) => r.pairs.join(' ')).join('; ')}): quote them, --found 'C=40.00 H=6.71'` });
      const run0 = { ...runs[0], pairs: [o.found, ...runs[0].pairs], start: runs[0].start - 1 };
      checkRun(run0, 'set of found values');
      const masses = inputs.filter((_, i) => i < runs[0].start || i >= runs[0].end);
      const options: CandidatesCliOptions = { ...o, found: run0.pairs.join(' '), foundNote: joinedNote(run0, 'set of found values (with --found)') };
      return run('candidates', masses, options);
    }
    return run('candidates', inputs, o);
  });
}
