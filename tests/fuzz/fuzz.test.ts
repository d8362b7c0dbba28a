// The fuzz harness with a fixed seed, as CI runs it. `npm run fuzz` runs it long with a random seed
// (FUZZ_RUNS, FUZZ_SEED) and prints the counts of every kind of violation.
import { describe, expect, it } from 'vitest';
import { COMMANDS, fuzz } from './harness.js';

const long = process.env.FUZZ_RUNS !== undefined;
const runs = Number(process.env.FUZZ_RUNS ?? 300);
// CI uses a fixed seed; a long run a random one unless FUZZ_SEED is given (it is printed)
const seed = Number(process.env.FUZZ_SEED ?? (long ? Math.floor(Math.random() * 2 ** 31) : 20261201));

describe('fuzzing every command through the CLI', () => {
  it(`answers every generated input (seed ${seed}, ${runs} per command)`, async () => {
    const report = await fuzz({ seed, runsPerCommand: runs, slowMs: long ? 1000 : 5000, hangMs: long ? 6000 : 15000 });
    if (long) {
      console.log(JSON.stringify({ seed, runs: report.runs, counts: report.counts }, null, 1));
      for (const e of report.examples) console.log(e.violation, JSON.stringify(e.case), e.stderr.replace(/\n/g, ' | '));
    }
    expect(report.runs).toBeGreaterThanOrEqual(Object.keys(COMMANDS).length * 2);
    const hard = ['hang', 'thrown', 'bad-exit', 'internal-error', 'stack-overflow', 'bad-json', 'row-count'] as const;
    const found = Object.fromEntries(hard.filter((k) => report.counts[k]).map((k) => [k, report.examples.filter((e) => e.violation === k).map((e) => e.case)]));
    expect(found).toEqual({});
  }, 600_000);
});
