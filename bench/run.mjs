// npm run bench: start-up and batch throughput of the built CLI, each as a
// ratio to a baseline measured in the same run (the machine may be shared:
// compare ratios, not milliseconds).
//   start-up:  each command against `node -e 0` (goal ≤ 1.2×)
//   import:    the library's ESM and CommonJS entry points over `node -e 0` (goal ≤ 100 ms)
//   batch:     over the same lines, against a bare Node loop that writes one
//              JSON object per line (bench/bare-loop.mjs), with an echo-only
//              floor (bench/echo-loop.mjs): mass --json (goal ≤ 1.5×),
//              composition --json (≤ 2.5×), mass --json on the realistic mix
//              (charges, D, decimal counts, '.' hydrates, Unicode subscripts,
//              spaces; ≤ 2×), the default tables of mass (≤ 3×) and
//              composition (≤ 4×)
//   memory:    peak for 30,000 and 300,000 lines (flat is the goal)
//   quantity:  calc, balance, analysis, prepare, empirical and candidates
//              batches against the bare loop, and the peak memory of mass --json
//              up to 10⁷ lines (bench/quantity-rows.mjs)
//   long:      each command's slowest answer to a long input or option value
//              (goal < 1 s; bench/long-inputs.mjs)
//   `--quick` runs fewer repetitions and start-up for a few commands only.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { generateFormulas, generateMixedFormulas } from './generate-formulas.mjs';
import { longInputRows } from './long-inputs.mjs';
import { quantityRows } from './quantity-rows.mjs';
import { median, timeBatch } from './time-batch.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const bin = `${root}bin/pondus.cjs`;
if (!existsSync(`${root}dist/cli.cjs`)) {
  console.error('bench: build first (npm run build)');
  process.exit(2);
}
const quick = process.argv.includes('--quick');
const ms = (t0) => Number(process.hrtime.bigint() - t0) / 1e6;

// --- start-up --------------------------------------------------------------
function timeSpawn(args) {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, args, { stdio: 'ignore' });
  if (r.status !== 0 && r.status !== 1) throw new Error(`${args.join(' ')} exited ${r.status}`);
  return ms(t0);
}
// start-up differences are a few milliseconds on a ~100 ms process: 31 alternating rounds give a steady median
const runs = quick ? 7 : 31;
const startCommands = quick
  ? [['mass', 'H2O'], ['composition', 'H2O'], ['calc', '2.00 g / 4.0 mL'], ['--version'], ['--help']]
  : [
      ['mass', 'H2O'], ['composition', 'H2O'], ['calc', '2.00 g / 4.0 mL'], ['balance', 'H2 + O2 -> H2O'],
      ['analysis', 'C6H12O6', '--found', 'C=40.00,H=6.71'], ['empirical', 'C=40.00 H=6.71 O=53.29'],
      ['prepare', 'NaCl', '--concentration', '0.100 M', '--volume', '250.0 mL'], ['--version'], ['--help'],
    ];
for (const c of startCommands) timeSpawn([bin, ...c]); // warm the file cache (and each bundle's code cache)
const node0 = [];
const starts = startCommands.map(() => []);
for (let i = 0; i < runs; i++) {
  node0.push(timeSpawn(['-e', '0']));
  startCommands.forEach((c, j) => starts[j].push(timeSpawn([bin, ...c])));
}
// library import: ESM and CommonJS entry points, over the same node start-up
const esmImport = [];
const cjsImport = [];
for (let i = 0; i < runs; i++) {
  esmImport.push(timeSpawn(['-e', `import(${JSON.stringify(`${root}dist/lib/index.js`)})`]));
  cjsImport.push(timeSpawn(['-e', `require(${JSON.stringify(`${root}dist/lib/index.cjs`)})`]));
}

// --- batch -----------------------------------------------------------------
const dataDir = `${root}bench/.data`;
mkdirSync(dataDir, { recursive: true });
function dataFile(name, n, gen) {
  const f = `${dataDir}/${name}-${n}.txt`;
  if (!existsSync(f)) writeFileSync(f, [...gen(n)].join('\n') + '\n');
  return f;
}

const plain300 = dataFile('formulas', 300_000, generateFormulas);
const plain30 = dataFile('formulas', 30_000, generateFormulas);
const mixed300 = dataFile('mixed', 300_000, generateMixedFormulas);
// 7 rounds: on a shared machine a row moves by ±0.5 between runs of 5
const reps = quick ? 3 : 7;
const bareLoop = `${root}bench/bare-loop.mjs`;
const echoLoop = `${root}bench/echo-loop.mjs`;
// the best plain JavaScript can do for mass --json on plain formulas: the same bytes, no pondus code
const plainJs = `${root}bench/plain-js-mass.mjs`;
const plainJsTimes = [];
// each row: [label, args, file, goal]; the baselines of its file run in the same rounds
const rows = [
  ['mass --json', [bin, 'mass', '--json', '-'], plain300, 1.5],
  ['composition --json', [bin, 'composition', '--json', '-'], plain300, 2.5],
  ['mass --json, realistic mix', [bin, 'mass', '--json', '-'], mixed300, 2],
  ['mass, default table', [bin, 'mass', '-'], plain30, 3],
  ['composition, default table', [bin, 'composition', '-'], plain30, 4],
];
const files = [...new Set(rows.map((r) => r[2]))];
const bare = new Map(files.map((f) => [f, []]));
const echo = new Map(files.map((f) => [f, []]));
const times = rows.map(() => []);
let peakBig = 0;
for (let i = 0; i < reps; i++) {
  for (const f of files) {
    bare.get(f).push((await timeBatch([bareLoop], f)).ms);
    echo.get(f).push((await timeBatch([echoLoop], f)).ms);
  }
  for (let j = 0; j < rows.length; j++) {
    const r = await timeBatch(rows[j][1], rows[j][2]);
    times[j].push(r.ms);
    if (j === 0) peakBig = Math.max(peakBig, r.peakMB);
  }
  plainJsTimes.push((await timeBatch([plainJs], plain300)).ms);
}
const peakSmall = (await timeBatch([bin, 'mass', '--json', '-'], plain30)).peakMB;

// --- candidate formulas up to 1,000 Da (library, in this process) -----------------
const { candidateFormulas, formulaMass } = await import(`${root}dist/lib/index.js`);
const candidateRuns = [];
for (const formula of ['C43H66N12O12S2', 'C50H73N15O11', 'C45H57ClF3N7O9S']) {
  const mass = formulaMass(formula).monoisotopicMass.toFixed(5);
  const t0 = process.hrtime.bigint();
  const r = candidateFormulas({ mass, ppm: 5, limit: 1000 });
  candidateRuns.push({ formula, ms: ms(t0), n: r.candidates.length });
}

const f = (x) => x.toFixed(1);
const nodeMs = median(node0);
console.log(`start-up  node -e 0: ${f(nodeMs)} ms (goal ≤ 1.2× for every command)`);
startCommands.forEach((c, j) => console.log(`          pondus ${c.join(' ')}: ${f(median(starts[j]))} ms   ${(median(starts[j]) / nodeMs).toFixed(2)}×`));
console.log(`import    library (over node -e 0): ESM ${f(median(esmImport) - nodeMs)} ms, require ${f(median(cjsImport) - nodeMs)} ms (goal ≤ 100 ms)`);
const lines = (file) => (file === plain30 ? '30,000' : '300,000');
for (const file of files) {
  console.log(`baseline  ${file.slice(file.lastIndexOf('/') + 1)}: bare loop ${f(median(bare.get(file)))} ms, echo-only floor ${f(median(echo.get(file)))} ms (${(median(echo.get(file)) / median(bare.get(file))).toFixed(2)}× the bare loop)`);
}
console.log('batch     (ratio to the bare loop on the same lines, median of the rounds)');
rows.forEach(([label, , file, goal], j) => {
  const ratio = median(times[j]) / median(bare.get(file));
  console.log(`          ${label.padEnd(28)} ${f(median(times[j])).padStart(8)} ms for ${lines(file)} lines   ${ratio.toFixed(2)}× (goal ≤ ${goal}×)`);
});
console.log(`          plain JavaScript, mass --json ${f(median(plainJsTimes)).padStart(8)} ms for 300,000 lines   ${(median(plainJsTimes) / median(bare.get(plain300))).toFixed(2)}× (bench/plain-js-mass.mjs: the same bytes); pondus is ${(median(times[0]) / median(plainJsTimes)).toFixed(2)}× it`);
console.log(`candidates  every CHNOPS+halogen formula within 5 ppm near 1,000 Da (default ranges): ${candidateRuns.map((c) => `${c.formula} ${f(c.ms)} ms (${c.n} fits)`).join('; ')} (goal < 1000 ms each)`);
// isotope patterns (issue: the aggregated pattern of a protein-sized formula; a fine structure to 99.9 %)
const lib = await import(`${root}dist/lib/index.js`);
const timeLib = (f, n) => { const t = []; for (let i = 0; i < n; i++) { const t0 = process.hrtime.bigint(); f(); t.push(ms(t0)); } return median(t); };
const aggMs = timeLib(() => lib.isotopePattern('C257H383N65O77S6'), quick ? 3 : 7);
const fineMs = timeLib(() => lib.isotopePattern('C100H150N20O30S2', { kind: 'fine', coverage: 0.999 }), quick ? 3 : 7);
console.log(`pattern   aggregated C257H383N65O77S6: ${f(aggMs)} ms; fine structure of C100H150N20O30S2 to 99.9 %: ${f(fineMs)} ms`);
const { candidatesGrowth } = await import('./candidates-growth.mjs');
let growthTable = '';
for (const r of await candidatesGrowth({ quick })) {
  if (r.table !== growthTable) console.log(`candidates  cost by ${(growthTable = r.table)}`);
  console.log(`          ${r.label.padEnd(22)} ${f(r.ms).padStart(6)} ms   ${r.outcome}`);
}
console.log(`memory    peak ${peakSmall ? f(peakSmall) : 'n/a'} MB for 30,000 lines, ${peakBig ? f(peakBig) : 'n/a'} MB for 300,000 lines (mass --json)`);
for (const line of await quantityRows({ quick })) console.log(line);
for (const line of longInputRows({ quick })) console.log(line);
