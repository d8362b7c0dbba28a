/**
 * KEY=VALUE sets typed without quotes. The shell splits `empirical C=40.00 H=6.71
 * O=53.29` into three arguments; they are one measurement set. The rule:
 *
 * - an argument that is exactly one KEY=VALUE pair (one shell word) is a *pair*;
 *   with `units`, a following argument that is only a unit (`g`, `mg`, `%`) belongs
 *   to the pair before it (`NaCl=5.00 g` typed unquoted), and a quoted single pair
 *   with its unit (`'NaCl=5.00 g'`) is a pair too;
 * - consecutive pairs form one set, joined with spaces, and the result says so;
 * - an argument holding several pairs (quoted) is a set of its own and ends a run,
 *   so `'C=40 H=6.7 O=53.3' 'C=85.6 H=14.4'` stays two sets;
 * - a key repeated within a run means two sets were typed unquoted: refused as a
 *   usage error, since where one set ends is not known.
 */
import { fail } from '../../errors/pondus-error.js';
import { isSinglePair, readKeyValuePair } from '../../key-values/read-key-values.js';

export interface JoinedArgs {
  /** The inputs, with each run of pairs joined into one. */
  inputs: string[];
  /** For each joined input, the note saying which arguments it was made of. */
  joined: Record<string, string>;
}

const UNIT_ONLY = /^(%|[A-Za-zµμ]+(?:\/[A-Za-zµμ]+)?)$/;
const PAIR_WITH_UNIT = /^[^\s=,;:{}]+=\s*[-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?\s*(%|[A-Za-zµμ]+(?:\/[A-Za-zµμ]+)?)$/;

/** One run of consecutive pair arguments (with their units attached). */
export interface PairRun {
  /** Index in the argument list of the run's first argument. */
  start: number;
  /** Index after the run's last argument. */
  end: number;
  /** The pairs, each with its unit when one followed. */
  pairs: string[];
}

/**
 * Finds the runs of single KEY=VALUE arguments; with `units`, a unit-only argument after a pair
 * whose value is a bare number joins it.
 *
 * @example
 * pairRuns(['C=40', 'H=6.7', 'X'], false) // [{ start: 0, end: 2, pairs: ['C=40', 'H=6.7'] }]
 */
export function pairRuns(args: string[], units: boolean): PairRun[] {
  const runs: PairRun[] = [];
  let current: PairRun | null = null;
  for (let i = 0; i < args.length; i++) {
    const a = args[i];
    if (isSinglePair(a) || (units && PAIR_WITH_UNIT.test(a))) {
      current ??= { start: i, end: i, pairs: [] };
      current.pairs.push(a);
      current.end = i + 1;
      continue;
    }
    if (units && current && current.end === i && UNIT_ONLY.test(a) && /[0-9.]$/.test(current.pairs[current.pairs.length - 1])) {
      current.pairs[current.pairs.length - 1] += ` ${a}`;
      current.end = i + 1;
      continue;
    }
    if (current) runs.push(current);
    current = null;
  }
  if (current) runs.push(current);
  return runs;
}

/**
 * Refuses a run that repeats a key: two sets typed without quotes.
 *
 * @example
 * checkRun({ start: 0, end: 2, pairs: ['C=40', 'C=41'] }, 'measurement set') // throws USAGE
 */
export function checkRun(run: PairRun, what: string): void {
  const seen = new Set<string>();
  for (const p of run.pairs) {
    const key = readKeyValuePair(p)!.keyText;
    if (seen.has(key)) {
      throw fail({ code: 'USAGE', message: `the arguments ${run.pairs.join(' ')} give ${key} twice: they cannot be one ${what}. Quote each ${what}, e.g. 'C=40.00 H=6.71 O=53.29' 'C=85.6 H=14.4'` });
    }
    seen.add(key);
  }
}

/**
 * The note for a run joined into one set.
 *
 * @example
 * joinedNote({ start: 0, end: 2, pairs: ['C=40', 'H=6.7'] }, 'measurement set') // '2 arguments (C=40, H=6.7) were read as one measurement set: …'
 */
export function joinedNote(run: PairRun, what: string): string {
  const n = run.end - run.start;
  return `${n} arguments (${run.pairs.join(', ')}) were read as one ${what}: each argument held one KEY=VALUE pair${n > run.pairs.length ? ' or its unit' : ''}; quote a whole set ('…') to keep sets apart`;
}

/**
 * Joins runs of single KEY=VALUE arguments into one input each (see the module comment).
 *
 * @example
 * joinPairArgs(['C=40.00', 'H=6.71', 'O=53.29'], { what: 'measurement set' }).inputs // ['C=40.00 H=6.71 O=53.29']
 */
export function joinPairArgs(args: string[], options: { what: string; units?: boolean }): JoinedArgs {
  const runs = pairRuns(args, options.units ?? false);
  const inputs: string[] = [];
  const joined: Record<string, string> = Object.create(null);
  let i = 0;
  for (const run of runs) {
    inputs.push(...args.slice(i, run.start));
    const single = run.end - run.start === 1;
    if (single) inputs.push(args[run.start]);
    else {
      checkRun(run, options.what);
      const text = run.pairs.join(' ');
      inputs.push(text);
      joined[text] = joinedNote(run, options.what);
    }
    i = run.end;
  }
  inputs.push(...args.slice(i));
  return { inputs, joined };
}

/** Arguments of one command re-read with unit words joined to the number before them. */
export interface UnitJoined {
  positionals: string[];
  /** Option values (by option name without dashes), with their units joined. */
  values: Record<string, string>;
  /** What was joined, for the note: '0.1000 g', '--co2 0.2000 g'. */
  joined: string[];
}

/**
 * Re-reads a command's raw arguments so that a unit typed as a word of its own (`0.1000 g`
 * unquoted) joins the number before it, whether that number is an argument or an option value.
 *
 * @example
 * joinUnitWords(['combustion', '0.1000', 'g', '--co2', '0.2000', 'g'], 'combustion', new Set(['co2'])).values.co2 // '0.2000 g'
 */
export function joinUnitWords(raw: string[], command: string, valueOptions: Set<string>): UnitJoined | null {
  const at = raw.indexOf(command);
  if (at < 0) return null;
  const positionals: string[] = [];
  const values: Record<string, string> = Object.create(null);
  const joined: string[] = [];
  let last: { option: string } | { index: number } | null = null;
  for (let i = at + 1; i < raw.length; i++) {
    const t = raw[i];
    if (t === '--') {
      positionals.push(...raw.slice(i + 1));
      break;
    }
    if (t.startsWith('--')) {
      const eq = t.indexOf('=');
      const name = eq >= 0 ? t.slice(2, eq) : t.slice(2);
      if (!valueOptions.has(name)) {
        last = null;
        continue;
      }
      if (eq >= 0) values[name] = t.slice(eq + 1);
      else if (i + 1 < raw.length) values[name] = raw[++i];
      last = { option: name };
      continue;
    }
    const previous = last === null ? null : 'option' in last ? values[last.option] : positionals[last.index];
    if (previous !== null && UNIT_ONLY.test(t) && /[0-9.]$/.test(previous)) {
      const text = `${previous} ${t}`;
      if (last !== null && 'option' in last) {
        values[last.option] = text;
        joined.push(`--${last.option} ${text}`);
      } else if (last !== null) {
        positionals[last.index] = text;
        joined.push(text);
      }
      last = null;
      continue;
    }
    positionals.push(t);
    last = { index: positionals.length - 1 };
  }
  return { positionals, values, joined };
}

/**
 * The note for a joined input, given once: a later line of standard input with the same text was
 * not joined from arguments and gets no note.
 *
 * @example
 * takeJoinedNote({ 'C=40 H=6.7': 'joined' }, 'C=40 H=6.7') // 'joined' (then undefined)
 */
export function takeJoinedNote(joined: Record<string, string> | undefined, input: string): string | undefined {
  if (!joined || !Object.hasOwn(joined, input)) return undefined;
  const note = joined[input];
  delete joined[input];
  return note;
}
