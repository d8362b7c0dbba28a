// The fuzz harness with a fixed seed, as CI runs it. `npm run fuzz` runs it long with a random seed
// (FUZZ_RUNS, FUZZ_SEED; FUZZ_COMMANDS=mass,calc for some commands only), prints the counts of every
// kind of violation, shrinks one example of each and adds it to reproducers.json, which every run
// replays first as regression tests.
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { CliWorker, COMMANDS, fuzz, shrinkCase, violations, type Case, type Violation } from './harness.js';

const long = process.env.FUZZ_RUNS !== undefined;
const runs = Number(process.env.FUZZ_RUNS ?? 300);
// CI uses a fixed seed; a long run a random one unless FUZZ_SEED is given (it is printed)
const seed = Number(process.env.FUZZ_SEED ?? (long ? Math.floor(Math.random() * 2 ** 31) : 20261201));
const commands = process.env.FUZZ_COMMANDS?.split(',');
const REPRODUCERS = join(__dirname, 'reproducers.json');
// what fails the CI run; every other kind is counted and reported
const HARD = ['hang', 'thrown', 'bad-exit', 'internal-error', 'stack-overflow', 'bad-json', 'row-count', 'null-or-nan', 'formula-trigger', 'control-in-table', 'bad-csv'] as const;
// shrunk and kept by a long run
const KEPT: readonly Violation[] = [...HARD, 'control-in-stderr'];

/**
 * A shrunk input that once broke the contract. 'fixed': it must not break it again. 'open': a known
 * failure not fixed yet, which must still show (when it stops, mark it fixed).
 */
interface Reproducer {
  violation: Violation;
  status: 'fixed' | 'open';
  /** What it was, in a few words. */
  about?: string;
  case: Case;
}
const reproducers = JSON.parse(readFileSync(REPRODUCERS, 'utf8')) as Reproducer[];

describe('fuzzing every command through the CLI', () => {
  const replay = new CliWorker(15_000);
  afterAll(() => replay.close());
  it.each(reproducers.map((r) => [`${r.status} ${r.violation}: ${JSON.stringify(r.case.args).slice(0, 80)}`, r] as const))('reproducer %s', async (_, r) => {
    const o = await replay.run(r.case);
    const found = violations(r.case, o, 5000).filter((v) => v !== 'slow');
    if (r.status === 'fixed') expect(found).toEqual([]);
    else expect(found).toContain(r.violation);
  }, 30_000);

  it(`answers every generated input (seed ${seed}, ${runs} per command)`, async () => {
    const report = await fuzz({ seed, runsPerCommand: runs, slowMs: long ? 1000 : 5000, hangMs: long ? 6000 : 15000, commands });
    if (long) {
      console.log(JSON.stringify({ seed, runs: report.runs, ms: report.ms, counts: report.counts }, null, 1));
      for (const e of report.examples) console.log(e.violation, JSON.stringify(e.case), e.stderr.replace(/\n/g, ' | '));
      // one shrunk reproducer per kind of violation (not 'slow': timing depends on the machine)
      const worker = new CliWorker(6000);
      try {
        const known = new Set(reproducers.map((r) => r.violation + JSON.stringify(r.case)));
        for (const kind of KEPT) {
          const e = report.examples.find((x) => x.violation === kind);
          if (!e) continue;
          const small = await shrinkCase(worker, e.case, kind);
          console.log('shrunk', kind, JSON.stringify(small));
          if (!known.has(kind + JSON.stringify(small))) reproducers.push({ violation: kind, status: 'open', case: small });
        }
      } finally {
        await worker.close();
      }
      writeFileSync(REPRODUCERS, JSON.stringify(reproducers, null, 1) + '\n');
    }
    expect(report.runs).toBeGreaterThanOrEqual((commands?.length ?? Object.keys(COMMANDS).length) * 2);
    const found = Object.fromEntries(HARD.filter((k) => report.counts[k]).map((k) => [k, report.examples.filter((e) => e.violation === k).map((e) => e.case)]));
    expect(found).toEqual({});
  }, 3_600_000);
});
