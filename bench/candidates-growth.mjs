// How the cost of a candidate search grows: with the mass (up to 2,000 Da, default element ranges,
// and the default ranges with one metal) and with the number of elements allowed (at 500 and
// 1,000 Da). Each figure is the median of a few runs of the library call, in milliseconds, with
// the size of the search (formulas visited) beside it; a refused search shows its refusal.
//   node bench/candidates-growth.mjs [--quick]     (build first: npm run build)
// Exported as candidatesGrowth() for a bench runner that prints its rows.
import { existsSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const DEFAULT = 'C0-80 H0-160 N0-10 O0-20 S0-4 P0-2 F0-6 Cl0-4 Br0-3 I0-2';
const STEPS = ['C0-80 H0-160', 'N0-10', 'O0-20', 'S0-4', 'P0-2', 'F0-6', 'Cl0-4', 'Br0-3', 'I0-2', 'Fe0-1', 'Na0-1', 'B0-2', 'Si0-2'];

const median = (a) => [...a].sort((x, y) => x - y)[a.length >> 1];

function timeSearch(candidateFormulas, options, runs) {
  const times = [];
  let outcome = '';
  for (let i = 0; i < runs; i++) {
    const t0 = process.hrtime.bigint();
    try {
      const r = candidateFormulas(options);
      outcome = `${r.visited.toLocaleString('en-US')} visited, ${r.plausible} plausible`;
    } catch (e) {
      outcome = `refused (${e.first?.code ?? e.message})`;
    }
    times.push(Number(process.hrtime.bigint() - t0) / 1e6);
  }
  return { ms: median(times), outcome };
}

/**
 * Rows of the growth tables: { table, label, ms, outcome }.
 */
export async function candidatesGrowth({ quick = false } = {}) {
  const { candidateFormulas } = await import(pathToFileURL(`${root}dist/lib/index.js`).href);
  const runs = quick ? 1 : 3;
  const rows = [];
  // a fixed fractional part keeps the windows comparable across masses
  const masses = [250, 500, 750, 1000, 1250, 1500, 1750, 2000];
  for (const [table, extra] of [['mass, default ranges, ±5 ppm', ''], ['mass, default ranges + Fe0-1, ±5 ppm', ' Fe0-1'], ['mass, default ranges + Na0-1, ±5 ppm', ' Na0-1']]) {
    for (const mass of masses) rows.push({ table, label: `${mass} Da`, ...timeSearch(candidateFormulas, { mass: `${mass}.1234`, ppm: 5, elements: DEFAULT + extra }, runs) });
  }
  for (const mass of [500, 1000]) {
    for (let k = 1; k <= STEPS.length; k++) {
      const elements = STEPS.slice(0, k).join(' ');
      const label = `${k + 1} elements (+${STEPS[k - 1].replace(/[0-9-]+/g, '').split(' ').pop()})`;
      rows.push({ table: `elements allowed, ${mass}.1234 Da, ±5 ppm`, label, ...timeSearch(candidateFormulas, { mass: `${mass}.1234`, ppm: 5, elements }, runs) });
    }
  }
  return rows;
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) {
  if (!existsSync(`${root}dist/lib/index.js`)) {
    console.error('candidates-growth: build first (npm run build)');
    process.exit(2);
  }
  const rows = await candidatesGrowth({ quick: process.argv.includes('--quick') });
  let table = '';
  for (const r of rows) {
    if (r.table !== table) {
      table = r.table;
      console.log(`\ncandidates: cost by ${table}`);
    }
    console.log(`  ${r.label.padEnd(22)} ${r.ms.toFixed(0).padStart(6)} ms   ${r.outcome}`);
  }
}
