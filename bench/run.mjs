// npm run bench: start-up and batch throughput of the built CLI, each as a
// ratio to a baseline measured in the same run.
//   start-up: `pondus mass H2O` against `node -e 0` (goal ≤ 1.5×)
//   batch:    `pondus mass --json -` over 300,000 distinct formulas against a
//             bare Node loop writing one JSON object per line (goal ≤ 3×),
//             with peak memory for 30,000 and 300,000 lines (flat is the goal)
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, openSync, closeSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { generateFormulas } from './generate-formulas.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const bin = `${root}bin/pondus.cjs`;
if (!existsSync(`${root}dist/cli.cjs`)) {
  console.error('bench: build first (npm run build)');
  process.exit(2);
}
const quick = process.argv.includes('--quick');
const median = (a) => [...a].sort((x, y) => x - y)[a.length >> 1];
const ms = (t0) => Number(process.hrtime.bigint() - t0) / 1e6;

// --- start-up --------------------------------------------------------------
function timeSpawn(args) {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, args, { stdio: 'ignore' });
  if (r.status !== 0) throw new Error(`${args.join(' ')} exited ${r.status}`);
  return ms(t0);
}
const runs = quick ? 9 : 21;
const node0 = [];
const mass = [];
timeSpawn([bin, 'mass', 'H2O']); // warm the file cache
for (let i = 0; i < runs; i++) {
  node0.push(timeSpawn(['-e', '0']));
  mass.push(timeSpawn([bin, 'mass', 'H2O']));
}
const startRatio = median(mass) / median(node0);
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
function dataFile(n) {
  const f = `${dataDir}/formulas-${n}.txt`;
  if (!existsSync(f)) writeFileSync(f, [...generateFormulas(n)].join('\n') + '\n');
  return f;
}

/** Runs a command with a file on standard input; returns wall time and peak memory (from /proc, sampled). */
function timeBatch(args, file) {
  return new Promise((resolve, reject) => {
    const fd = openSync(file, 'r');
    const t0 = process.hrtime.bigint();
    const child = spawn(process.execPath, args, { stdio: [fd, 'ignore', 'inherit'] });
    let peak = 0;
    const sample = () => {
      try {
        const m = /VmHWM:\s+(\d+)/.exec(require_proc(child.pid));
        if (m) peak = Math.max(peak, Number(m[1]));
      } catch {
        /* the process has ended */
      }
    };
    const timer = setInterval(sample, 20);
    child.on('exit', (code) => {
      clearInterval(timer);
      closeSync(fd);
      if (code !== 0 && code !== 1) reject(new Error(`${args.join(' ')} exited ${code}`));
      else resolve({ ms: ms(t0), peakMB: peak / 1024 });
    });
  });
}
import { readFileSync } from 'node:fs';
function require_proc(pid) {
  return readFileSync(`/proc/${pid}/status`, 'utf8');
}

const big = dataFile(300_000);
const small = dataFile(30_000);
const reps = quick ? 1 : 5;
const bare = [];
const batch = [];
let peakBig = 0;
for (let i = 0; i < reps; i++) {
  bare.push((await timeBatch([`${root}bench/bare-loop.mjs`], big)).ms);
  const r = await timeBatch([bin, 'mass', '--json', '-'], big);
  batch.push(r.ms);
  peakBig = Math.max(peakBig, r.peakMB);
}
const peakSmall = (await timeBatch([bin, 'mass', '--json', '-'], small)).peakMB;
const batchRatio = median(batch) / median(bare);

// --- candidate formulas up to 1,000 Da (library, in this process) -----------------
const { candidateFormulas, formulaMass } = await import(`${root}dist/lib/index.js`);
const candidateRuns = [];
for (const formula of ['C43H66N12O12S2', 'C50H73N15O11', 'C45H57ClF3N7O9S']) {
  const mass = formulaMass(formula).monoisotopicMass.toFixed(5);
  const t0 = process.hrtime.bigint();
  const r = candidateFormulas({ mass, ppm: 5, limit: 100000 });
  candidateRuns.push({ formula, ms: ms(t0), n: r.candidates.length });
}

const f = (x) => x.toFixed(1);
console.log(`start-up  node -e 0: ${f(median(node0))} ms   pondus mass H2O: ${f(median(mass))} ms   ratio ${startRatio.toFixed(2)}× (goal ≤ 1.5×)`);
console.log(`import    library (over node -e 0): ESM ${f(median(esmImport) - median(node0))} ms, require ${f(median(cjsImport) - median(node0))} ms (goal ≤ 100 ms)`);
console.log(`batch     bare loop: ${f(median(bare))} ms   pondus mass --json: ${f(median(batch))} ms for 300,000 formulas   ratio ${batchRatio.toFixed(2)}× (goal ≤ 3×)`);
console.log(`candidates  every CHNOPS+halogen formula within 5 ppm near 1,000 Da (default ranges): ${candidateRuns.map((c) => `${c.formula} ${f(c.ms)} ms (${c.n} fits)`).join('; ')} (goal < 1000 ms each)`);
console.log(`memory    peak ${peakSmall ? f(peakSmall) : 'n/a'} MB for 30,000 lines, ${peakBig ? f(peakBig) : 'n/a'} MB for 300,000 lines`);
