// The best plain JavaScript can do for `pondus mass --json -` on plain formulas: no pondus code,
// a straightforward hand parser (element symbols, whole counts, (), [], {} and the '·' addition
// dot with a multiplier), the same atomic weights (the standard value, or the conventional one
// where CIAAW gives an interval) and principal-isotope masses, read from the same data files, and
// exact sums in integers of 10^-12 u, so every number is the nearest double to the exact sum.
// Reads lines on standard input and writes the same bytes as `pondus mass --json -` for the
// benchmark's plain formulas (bench/generate-formulas.mjs generateFormulas); anything else (a
// charge, an isotope, a decimal count, an unknown symbol) stops it with an error, since the
// comparison is only about plain formulas. Same reading and writing scheme as bench/bare-loop.mjs.
import { readFileSync } from 'node:fs';

const data = (name) => JSON.parse(readFileSync(new URL(`../src/elements/data/${name}`, import.meta.url), 'utf8'));

/** Exact decimal text (at most 12 decimals) to an integer in 10^-12 units. */
const pico = (text) => {
  const [int, frac = ''] = text.split('.');
  return Number(int + frac.padEnd(12, '0'));
};

const symbols = [];
const average = [];
const mono = [];
const nominal = [];
const idOf = new Map();
const isotopes = data('isotopes.json').isotopes;
for (const e of data('atomic-weights.json').elements) {
  const weight = e.value ?? e.conventional;
  const natural = isotopes[e.symbol]?.natural;
  if (weight === undefined || !natural) continue; // no standard atomic weight: not a plain formula here
  const principal = natural.reduce((a, b) => (Number(b[1]) > Number(a[1]) ? b : a));
  const id = symbols.length;
  symbols.push(e.symbol);
  average.push(pico(weight));
  mono.push(pico(principal[3]));
  nominal.push(principal[0]);
  idOf.set(e.symbol, id);
}
// Hill order: C, then H, then the rest alphabetically; without carbon, all alphabetically
const alphabetical = symbols.map((s, i) => [s, i]).sort((a, b) => (a[0] < b[0] ? -1 : 1));
const rankPlain = new Int32Array(symbols.length);
alphabetical.forEach(([, id], r) => (rankPlain[id] = r + 2));
const rankOrganic = rankPlain.slice();
const C = idOf.get('C');
const H = idOf.get('H');
rankOrganic[C] = 0;
rankOrganic[H] = 1;

const counts = new Float64Array(symbols.length);
const seen = [];
// per open bracket: where its atoms start in `stack`; atoms are kept as (id, count) until the
// bracket's count is known, then added up
const stackId = new Int32Array(4096);
const stackCount = new Float64Array(4096);

function fail(line, why) {
  process.stderr.write(`plain-js-mass: line ${line}: ${why}\n`);
  process.exit(1);
}

function row(text, line) {
  let sp = 0;
  const opens = [];
  let i = 0;
  const n = text.length;
  let multiplier = 1;
  let componentStart = 0;
  const number = () => {
    let v = 0;
    const s = i;
    while (i < n) {
      const c = text.charCodeAt(i);
      if (c < 48 || c > 57) break;
      v = v * 10 + (c - 48);
      i++;
    }
    return i === s ? 1 : v;
  };
  const endComponent = () => {
    if (opens.length) fail(line, 'unclosed bracket');
    for (let k = componentStart; k < sp; k++) stackCount[k] *= multiplier;
  };
  if (n > 0 && text.charCodeAt(0) >= 48 && text.charCodeAt(0) <= 57) multiplier = number();
  while (i < n) {
    const c = text.charCodeAt(i);
    if (c >= 65 && c <= 90) {
      let j = i + 1;
      while (j < n && text.charCodeAt(j) >= 97 && text.charCodeAt(j) <= 122) j++;
      const id = idOf.get(text.slice(i, j));
      if (id === undefined) fail(line, `not a plain formula: ${text}`);
      i = j;
      stackId[sp] = id;
      stackCount[sp++] = number();
    } else if (c === 40 || c === 91 || c === 123) {
      opens.push(sp);
      i++;
    } else if (c === 41 || c === 93 || c === 125) {
      if (!opens.length) fail(line, 'unmatched bracket');
      const from = opens.pop();
      i++;
      const k = number();
      for (let a = from; a < sp; a++) stackCount[a] *= k;
    } else if (c === 0xb7) {
      endComponent();
      i++;
      componentStart = sp;
      multiplier = number();
    } else fail(line, `not a plain formula: ${text}`);
  }
  endComponent();
  for (let k = 0; k < sp; k++) {
    const id = stackId[k];
    if (counts[id] === 0) seen.push(id);
    counts[id] += stackCount[k];
  }
  const rank = counts[C] > 0 ? rankOrganic : rankPlain;
  seen.sort((a, b) => rank[a] - rank[b]);
  let formula = '';
  let molar = 0;
  let monoSum = 0;
  let nominalSum = 0;
  for (const id of seen) {
    const k = counts[id];
    formula += k === 1 ? symbols[id] : symbols[id] + k;
    molar += k * average[id];
    monoSum += k * mono[id];
    nominalSum += k * nominal[id];
    counts[id] = 0;
  }
  seen.length = 0;
  if (!Number.isSafeInteger(molar) || !Number.isSafeInteger(monoSum)) fail(line, 'sum past the exact range of this sketch');
  return `{"line":${line},"input":${JSON.stringify(text)},"formula":"${formula}","molarMass":${JSON.stringify(molar / 1e12)},"monoisotopicMass":${JSON.stringify(monoSum / 1e12)},"nominalMass":${nominalSum},"charge":0,"notes":[]}\n`;
}

process.stdin.setEncoding('utf8');
let rest = '';
let line = 0;
for await (const chunk of process.stdin) {
  const lines = (rest + chunk).split('\n');
  rest = lines.pop();
  let out = '';
  for (const l of lines) out += row(l, ++line);
  if (!process.stdout.write(out)) await new Promise((r) => process.stdout.once('drain', r));
}
if (rest) process.stdout.write(row(rest, ++line));
