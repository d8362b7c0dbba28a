// The batch rows of the quantity commands, each against the bare loop
// (bench/bare-loop.mjs) on the same lines in the same rounds:
//   calc, one expression a line (goal ≤ 5×); balance (≤ 5×); analysis without
//   solvents (≤ 5×); prepare with the options fixed (≤ 5×); empirical, 3,000
//   measurement sets (≤ 20×); candidates, 200 masses near 150–900 Da (no goal,
//   one run; the first 50 with --quick); and the peak memory of mass --json at 10⁵, 10⁶ and 10⁷ lines with
//   no heap cap (10⁷ only without --quick).
// Inputs come from bench/generate-quantities.mjs and are written once into bench/.data.
//   node bench/quantity-rows.mjs [--quick]    (build first: npm run build)
// Exported as quantityRows() for bench/run.mjs, which prints its lines.
import { createWriteStream, existsSync, mkdirSync, renameSync, statSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { generateFormulas } from './generate-formulas.mjs';
import { generateAnalysis, generateCalc, generateEquations, generateMasses, generateMeasurementSets, generateReagents } from './generate-quantities.mjs';
import { median, timeBatch } from './time-batch.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const bin = `${root}bin/pondus.cjs`;
const bareLoop = `${root}bench/bare-loop.mjs`;
const dataDir = `${root}bench/.data`;

/** Writes the lines of a generator into bench/.data once (streamed, so 10⁷ lines stay in bounded memory). */
async function dataFile(name, n, gen) {
  mkdirSync(dataDir, { recursive: true });
  const f = `${dataDir}/${name}-${n}.txt`;
  if (existsSync(f) && statSync(f).size > 0) return f;
  const tmp = `${f}.part`;
  const out = createWriteStream(tmp);
  let buf = '';
  for (const line of gen(n)) {
    buf += line + '\n';
    if (buf.length > 1 << 20) {
      if (!out.write(buf)) await new Promise((r) => out.once('drain', r));
      buf = '';
    }
  }
  out.write(buf);
  await new Promise((r, j) => out.end((e) => (e ? j(e) : r())));
  renameSync(tmp, f);
  return f;
}

/** 10⁶ distinct formulas, then the same million again in another order of blocks: 10⁷ lines without holding 10⁷ strings. */
function* repeatedFormulas(n) {
  const block = 1_000_000;
  const base = [...generateFormulas(Math.min(n, block))];
  for (let i = 0; i < n; i++) yield base[(i + Math.floor(i / block) * 7919) % base.length];
}

/**
 * Runs the rows; returns the lines to print.
 *
 * @example
 * for (const line of await quantityRows({ quick: true })) console.log(line)
 */
export async function quantityRows({ quick = false } = {}) {
  const lib = await import(pathToFileURL(`${root}dist/lib/index.js`).href);
  const prepareOptions = ['--concentration', '0.100 M', '--volume', '250.0 mL'];
  const rows = [
    ['calc, one expression a line', ['calc', '--json', '-'], await dataFile('calc', 10_000, generateCalc), 5],
    ['balance', ['balance', '--json', '-'], await dataFile('equations', 10_000, generateEquations), 5],
    ['analysis, no solvents', ['analysis', '--json', '-'], await dataFile('analysis', 10_000, (n) => generateAnalysis(n, lib)), 5],
    ['prepare, options fixed', ['prepare', ...prepareOptions, '--json', '-'], await dataFile('reagents', 10_000, generateReagents), 5],
    ['empirical', ['empirical', '--json', '-'], await dataFile('measurements', 3_000, (n) => generateMeasurementSets(n, lib)), 20],
  ];
  // 9 rounds of these short runs: on a shared machine a row moved by ±1 between runs of 5
  const reps = quick ? 3 : 9;
  const bare = new Map(rows.map((r) => [r[2], []]));
  const times = rows.map(() => []);
  for (let i = 0; i < reps; i++) {
    for (const f of bare.keys()) bare.get(f).push((await timeBatch([bareLoop], f)).ms);
    for (let j = 0; j < rows.length; j++) times[j].push((await timeBatch([bin, ...rows[j][1]], rows[j][2])).ms);
  }
  const out = ['quantity  (ratio to the bare loop on the same lines, median of the rounds)'];
  const f1 = (x) => x.toFixed(1);
  rows.forEach(([label, args, file, goal], j) => {
    const b = median(bare.get(file));
    const n = Number(/-(\d+)\.txt$/.exec(file)[1]).toLocaleString('en-US');
    out.push(`          ${label.padEnd(30)} ${f1(median(times[j])).padStart(8)} ms for ${n} lines (bare loop ${f1(b)} ms)   ${(median(times[j]) / b).toFixed(2)}× (goal ≤ ${goal}×)`);
  });
  // candidates: one run (each search is a fraction of a second; 200 of them take a while), the first 50 with --quick
  const nMasses = quick ? 50 : 200;
  const masses = await dataFile('masses', nMasses, (n) => generateMasses(n, lib));
  const cb = (await timeBatch([bareLoop], masses)).ms;
  const c = await timeBatch([bin, 'candidates', '--json', '-'], masses);
  out.push(`          ${`candidates, ${nMasses} masses`.padEnd(30)} ${f1(c.ms).padStart(8)} ms (${f1(c.ms / nMasses)} ms a mass; bare loop ${f1(cb)} ms)   ${(c.ms / cb).toFixed(1)}× (no goal)`);
  // peak memory of mass --json, no heap cap
  const sizes = quick ? [100_000, 1_000_000] : [100_000, 1_000_000, 10_000_000];
  const peaks = [];
  for (const n of sizes) {
    const file = await dataFile('formulas-repeated', n, repeatedFormulas);
    const r = await timeBatch([bin, 'mass', '--json', '-'], file);
    peaks.push(`${f1(r.peakMB)} MB for ${n.toLocaleString('en-US')} lines (${f1(r.ms / 1000)} s)`);
  }
  out.push(`memory    mass --json peak, no heap cap: ${peaks.join(', ')}${quick ? ' (10,000,000 lines without --quick)' : ''}`);
  return out;
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) {
  if (!existsSync(`${root}dist/cli.cjs`)) {
    console.error('bench: build first (npm run build)');
    process.exit(2);
  }
  for (const line of await quantityRows({ quick: process.argv.includes('--quick') })) console.log(line);
}
