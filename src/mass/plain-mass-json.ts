/**
 * The batch hot path of `pondus mass --json`: for a plain formula (what the
 * parser's fast path reads — whole counts, natural elements, no charge, no
 * notes) the JSON line is computed over dense per-element arrays instead of
 * maps and result objects. It gives exactly the text of
 * massJsonLine(formulaMass(input)) (tests/mass/plain-mass-json.test.ts checks
 * this), and declines (null) whenever anything is not plain, so the general
 * path handles it.
 */
import { ELEMENTS } from '../elements/element-table.js';
import { getAtomData } from '../elements/atom-data.js';
import { scaledToJson } from '../exact/scaled.js';
import { fastParse } from '../formula-parser/fast-path.js';
import type { ComponentNode } from '../formula-parser/tree.js';
import { MAX_ATOMS } from '../formula/flatten.js';
import { alphabeticalRank } from '../formula/hill.js';
import { NEEDS_ESCAPE } from './mass-json.js';

const N = ELEMENTS.length + 1;
const Z_OF = new Map(ELEMENTS.map((e) => [e.symbol, e.z]));
const LABEL: string[] = new Array(N).fill('');
const STANDARD = new Float64Array(N);
const MONO = new Float64Array(N);
const NOMINAL = new Float64Array(N);
const PLAIN = new Float64Array(N); // alphabetical rank
const USABLE = new Uint8Array(N); // has a standard atomic weight
const ORGANIC = new Float64Array(N); // C, H, then alphabetical
let tablesReady = false;

/** Fills the per-element tables on first use (not at start-up: most runs never need them). */
function fillTables(): void {
  for (const e of ELEMENTS) {
    const d = getAtomData(e.symbol, null)!;
    LABEL[e.z] = e.symbol;
    STANDARD[e.z] = d.average.standard.scaled;
    MONO[e.z] = d.monoisotopic.scaled;
    NOMINAL[e.z] = d.nominal;
    USABLE[e.z] = d.noStandardWeight ? 0 : 1;
    PLAIN[e.z] = ORGANIC[e.z] = alphabeticalRank(e.symbol) + 2;
  }
  ORGANIC[C] = 0;
  ORGANIC[H] = 1;
  tablesReady = true;
}
const C = Z_OF.get('C')!;
const H = Z_OF.get('H')!;

// reused between calls: the batch loop is single-threaded
const counts = new Float64Array(N);
const touched: number[] = [];

function add(components: ComponentNode[], factor: number): boolean {
  for (const c of components) {
    const f = c.multiplier ? factor * Number(c.multiplier.text) : factor;
    for (const p of c.parts) {
      const g = p.count ? f * Number(p.count.text) : f;
      if (!Number.isSafeInteger(g)) return false;
      if (p.kind === 'atom') {
        const z = Z_OF.get(p.symbol)!;
        if (counts[z] === 0) touched.push(z);
        counts[z] += g;
      } else if (!add(p.body, g)) {
        return false;
      }
    }
  }
  return true;
}

/**
 * The `mass --json` line of a plain formula, or null when the general path must answer.
 *
 * @example
 * plainMassJsonLine('H2O') // '{"input":"H2O","formula":"H2O","molarMass":18.015,"monoisotopicMass":18.010564683056,"nominalMass":18,"charge":0}'
 */
export function plainMassJsonLine(input: string): string | null {
  const tree = fastParse(input);
  if (!tree || tree.notes.length > 0 || NEEDS_ESCAPE.test(input)) return null;
  if (!tablesReady) fillTables();
  touched.length = 0;
  try {
    if (!add(tree.components, 1)) return null;
    let organic = false;
    for (const z of touched) {
      if (counts[z] > MAX_ATOMS || !USABLE[z]) return null;
      if (z === C) organic = true;
    }
    // Hill order: C, H, then alphabetical when carbon is present; alphabetical otherwise
    const rank = organic ? ORGANIC : PLAIN;
    for (let i = 1; i < touched.length; i++) {
      const z = touched[i];
      let j = i - 1;
      while (j >= 0 && rank[touched[j]] > rank[z]) {
        touched[j + 1] = touched[j];
        j--;
      }
      touched[j + 1] = z;
    }
    let formula = '';
    let molar = 0;
    let mono = 0;
    let nominal = 0;
    for (const z of touched) {
      const n = counts[z];
      formula += n === 1 ? LABEL[z] : LABEL[z] + n;
      molar += n * STANDARD[z];
      mono += n * MONO[z];
      nominal += n * NOMINAL[z];
    }
    if (!Number.isSafeInteger(molar) || !Number.isSafeInteger(mono) || !Number.isSafeInteger(nominal)) return null;
    return `{"input":"${input}","formula":"${formula}","molarMass":${scaledToJson(molar)},"monoisotopicMass":${scaledToJson(mono)},"nominalMass":${nominal},"charge":0}`;
  } finally {
    for (const z of touched) counts[z] = 0;
  }
}
