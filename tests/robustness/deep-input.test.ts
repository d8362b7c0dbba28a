// Inputs whose depth the reader would follow: each is refused with its own code, or answered, on a
// stack half of Node's default, so no reader recurses on a depth the input controls. The library
// is run in a worker thread with a small stack (the built bundle, as a user imports it).
import { Worker } from 'node:worker_threads';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const LIB = join(__dirname, '..', '..', 'dist', 'lib', 'index.cjs');

/** Runs `safe<fn>(input)` in a worker with a 0.5 MB stack; returns the code, 'ok', or what was thrown. */
function inSmallStack(fn: string, input: string): Promise<string> {
  const code = `
    const { parentPort, workerData } = require('node:worker_threads');
    const lib = require(workerData.lib);
    let out;
    try {
      const r = lib[workerData.fn](workerData.input);
      out = r.success ? 'ok' : r.error.issues[0].code;
    } catch (e) {
      out = 'thrown ' + (e && e.constructor ? e.constructor.name : '') + ': ' + (e && e.message);
    }
    parentPort.postMessage(out);`;
  return new Promise((resolve, reject) => {
    const w = new Worker(code, { eval: true, workerData: { lib: LIB, fn, input }, resourceLimits: { stackSizeMb: 0.5 } });
    w.once('message', (m: string) => {
      void w.terminate();
      resolve(m);
    });
    w.once('error', reject);
  });
}

describe('no reader recurses on input-controlled depth', () => {
  it('re-cased readings tried for a hint get no hints of their own', async () => {
    // the hint search tries other letter cases of each run (nb → Nb, pb → Pb) and parses them
    expect(await inSmallStack('safeFormulaMass', 'nb[9pb]')).toBe('UNKNOWN_ELEMENT');
    expect(await inSmallStack('safeFormulaMass', 'PB[13CO]3')).toBe('UNKNOWN_ELEMENT');
    expect(await inSmallStack('safeFormulaMass', 'nb[9pb]'.repeat(40))).toBe('UNKNOWN_ELEMENT');
    expect(await inSmallStack('safeParseFormula', 'nacl(co2)cuso4pb[13co]3')).toBe('UNKNOWN_ELEMENT');
  });

  it('a chain of 4,000 signs is refused as too deep, not as too long', async () => {
    expect(await inSmallStack('safeCalc', `${'-'.repeat(4000)}1 g`)).toBe('NESTING_TOO_DEEP');
    expect(await inSmallStack('safeCalc', `${'- '.repeat(5)}1 g`)).toBe('NESTING_TOO_DEEP');
    expect(await inSmallStack('safeCalc', `1 g - ${'-'.repeat(3)}1 g`)).toBe('ok');
  });

  it('an expression of thousands of operations is refused before it is evaluated', async () => {
    expect(await inSmallStack('safeCalc', `${'1 g - '.repeat(1600)}1 g`)).toBe('INPUT_TOO_LONG');
    expect(await inSmallStack('safeCalc', `${'1-'.repeat(500)}1`)).toBe('ok');
  });

  it('parentheses and brackets past their limits are refused by their depth', async () => {
    expect(await inSmallStack('safeCalc', `${'('.repeat(3000)}1 g${')'.repeat(3000)}`)).toBe('NESTING_TOO_DEEP');
    expect(await inSmallStack('safeFormulaMass', `${'('.repeat(3000)}H${')'.repeat(3000)}`)).toBe('NESTING_TOO_DEEP');
    expect(await inSmallStack('safeFormulaMass', `${'[('.repeat(16)}H${')]'.repeat(16)}`)).toBe('ok');
    // the deepest accepted: 32 parentheses, each after 4 signs
    expect(await inSmallStack('safeCalc', `${'(----'.repeat(32)}1 g${')'.repeat(32)}`)).toBe('ok');
  });
});
