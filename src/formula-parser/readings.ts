/**
 * Readings that must be settled before a formula is computed: letters that are
 * element symbols and also a chemist's abbreviation (AcOH, TsCl, THF, NBS,
 * PrOH). By default such a formula is refused with both readings offered;
 * `abbreviations: true` reads the abbreviation (with a note), and
 * `abbreviations: 'none'` reads element symbols only.
 */
import type { Issue, Note } from '../errors/issue.js';
import { ABBREVIATIONS, readsAsElements } from './abbreviations.js';
import { REAGENTS, SOLVENTS, type NamedSubstance } from './names.js';
import { columnOf } from './prescan.js';
import type { AtomNode, ComponentNode, PartNode } from './tree.js';

/** How to read abbreviations, naming the option neutrally (the command line shows its flag, the library its option). */
const HOW_TO_ABBREVIATE = 'read abbreviations with `abbreviations: true`';

/** Group spellings that read as element symbols and contain D or T (TBS is T, B, S): refused wherever they stand in a run. */
const GROUP_RUNS = ['TBDPS', 'TIPS', 'TBS'];

/** Reagent names in mixed case whose letters read as element symbols (HOAt as H, O, At). */
const MIXED_CASE_RUNS = ['HOAt'];

/**
 * Names of buffers, media and polymers whose letters read as element symbols (PBS as P, B, S):
 * each is a mixture or a polymer, with no one formula to offer (common practice).
 */
const MIXTURE_RUNS: Readonly<Record<string, string>> = Object.freeze({
  PBS: 'phosphate-buffered saline, a buffer mixture',
  DPBS: "Dulbecco's phosphate-buffered saline, a buffer mixture",
  PBST: 'phosphate-buffered saline with Tween, a buffer mixture',
  TBST: 'Tris-buffered saline with Tween, a buffer mixture',
  HBSS: "Hanks' balanced salt solution, a mixture",
  BSS: 'a balanced salt solution, a mixture',
  SSC: 'saline-sodium citrate buffer, a mixture',
  PVP: 'polyvinylpyrrolidone, a polymer',
});

/** The refusal of a run that spells the name of a mixture or polymer. */
function mixtureIssue(run: Run, input: string): Issue {
  const elements = run.atoms.map((a) => written(input, a)).join(', ');
  const hasIsotope = /[DT]/.test(run.text);
  const other = hasIsotope ? asElementsText(run.text) : [...run.atoms.map((a) => written(input, a))].sort().join('');
  return {
    code: 'AMBIGUOUS_READING',
    message: `'${run.text}' reads as the elements ${elements}, but ${run.text} is also the name of ${MIXTURE_RUNS[run.text]}, which has no one formula`,
    column: columnOf(input, run.start),
    length: run.text.length,
    hint: `for a component of it, write that component's formula; for the elements, write ${other}${hasIsotope ? ' (hydrogen isotopes in brackets)' : ' (another order)'}`,
  };
}

/**
 * The refusals of runs that spell a mixture's or polymer's name (PBS, HBSS, PVP), for a formula
 * read with abbreviations, where the other readings are settled already: no reading gives such a
 * name a formula.
 *
 * @example
 * mixtureRefusals(parseFormula('H2O').components, 'H2O') // []
 */
export function mixtureRefusals(components: ComponentNode[], input: string): Issue[] {
  const issues: Issue[] = [];
  eachLevel(components, (parts) => {
    for (const run of runsOf(parts, input)) if (!run.counted && Object.hasOwn(MIXTURE_RUNS, run.text)) issues.push(mixtureIssue(run, input));
  });
  return issues;
}

/** Letter-only names whose letters read as element symbols (THF, NBS, DBU, …), and what each stands for. */
function nameFor(run: string): NamedSubstance | null {
  if (Object.hasOwn(REAGENTS, run) && (/^[A-Z]+$/.test(run) || MIXED_CASE_RUNS.includes(run))) return REAGENTS[run];
  if (/^[A-Z]{2,}$/.test(run) && Object.hasOwn(SOLVENTS, run.toLowerCase())) return SOLVENTS[run.toLowerCase()];
  return null;
}

/** One letter run: atoms written next to each other with no count between them (`THF`, `NBS`, `CDCl` in CDCl3). */
interface Run {
  atoms: AtomNode[];
  text: string;
  start: number;
  /** True when the last atom has a count (`CDI3`): the run is then not a whole name. */
  counted: boolean;
}

function written(input: string, a: AtomNode): string {
  return input.slice(a.span.start, a.count ? a.count.span.start : a.span.end);
}

function runsOf(parts: PartNode[], input: string): Run[] {
  const out: Run[] = [];
  let cur: AtomNode[] = [];
  const flush = () => {
    if (cur.length > 0) {
      const last = cur[cur.length - 1];
      out.push({ atoms: cur, text: cur.map((a) => written(input, a)).join(''), start: cur[0].span.start, counted: last.count !== null });
    }
    cur = [];
  };
  for (const p of parts) {
    const plainLetters = p.kind === 'atom' && /^[A-Z][a-z]?$/.test(written(input, p));
    if (!plainLetters) {
      flush();
      continue;
    }
    const prev = cur[cur.length - 1];
    if (prev && (prev.count !== null || prev.span.end !== p.span.start)) flush();
    cur.push(p as AtomNode);
  }
  flush();
  return out;
}

/** Calls `visit` for every parts list in the formula written by the user (not inside abbreviation expansions). */
function eachLevel(components: ComponentNode[], visit: (parts: PartNode[]) => void): void {
  for (const c of components) {
    visit(c.parts);
    for (const p of c.parts) if (p.kind === 'group' && !p.abbreviation) eachLevel(p.body, visit);
  }
}

/** Metals that carry a propyl group in everyday reagents (PrMgBr, PrLi, Pr2Zn, Pr4Sn). */
const ORGANOMETALLIC = new Set(['Li', 'Na', 'K', 'Mg', 'Zn', 'Cu', 'Sn', 'Hg', 'Cd']);

const ANION_VALENCE: Readonly<Record<string, number>> = { F: 1, Cl: 1, Br: 1, I: 1, O: 2, S: 2, Se: 2, Te: 2, N: 3, P: 3 };

/**
 * True when `Pr` at this level reads plausibly as praseodymium: no carbon or hydrogen beside it
 * (PrOH, PrNH2 and PrCH2… are propyl), and in a bracket-free binary such as PrCl3 or Pr6O11
 * the anions carry the charge of Pr(III) to Pr(IV) (PrBr and Pr3N are propyl compounds).
 */
function praseodymiumFits(parts: PartNode[]): boolean {
  const atoms = parts.filter((p): p is AtomNode => p.kind === 'atom');
  if (atoms.length === parts.length && atoms.every((a) => a.symbol === 'Pr')) return true; // the metal
  if (atoms.some((a) => a.symbol === 'C' || a.symbol === 'H')) return false;
  if (atoms.length !== parts.length) return true;
  let pr = 0;
  let anion = 0;
  for (const a of atoms) {
    const n = a.count ? Number(a.count.text) : 1;
    if (a.symbol === 'Pr') pr += n;
    else if (Object.hasOwn(ANION_VALENCE, a.symbol)) anion += n * ANION_VALENCE[a.symbol];
    else if (ORGANOMETALLIC.has(a.symbol)) return false; // PrMgBr, PrLi: propyl reagents
    else return true; // intermetallics and the like: not a propyl pattern
  }
  return anion >= 3 * pr && anion <= 4 * pr;
}

/** The input with every `from` (as a whole symbol) replaced by `to`. */
function replaceSymbol(input: string, from: string, to: string): string {
  return input.replace(new RegExp(`${from}(?![a-z])`, 'g'), to);
}

function asElementsText(run: string): string {
  return run.replace(/D/g, '[2H]').replace(/T/g, '[3H]');
}

/**
 * The readings of `components` that need settling, as issues (refusals with both readings) and notes.
 * Only the default reading mode asks; 'abbreviations' and 'elements' have settled it.
 *
 * @example
 * settleReadings(parseFormula('H2O', { abbreviations: 'none' }).components, 'H2O').issues // []
 */
export function settleReadings(components: ComponentNode[], input: string): { issues: Issue[]; notes: Note[] } {
  const issues: Issue[] = [];
  const notes: Note[] = [];
  const seen = new Set<string>();
  const symbols = new Set<string>();
  eachLevel(components, (parts) => {
    for (const p of parts) if (p.kind === 'atom') symbols.add(p.massNumber === null ? p.symbol : `${p.massNumber}${p.symbol}`);
    else if (p.abbreviation) symbols.add(p.abbreviation);
    else symbols.add('(');
  });
  const wholeName = REAGENTS[input.trim()];
  const named = wholeName ? ` (${input.trim()} is ${wholeName.name}, ${wholeName.formula})` : '';
  // each reading is refused once, and its message built only then (a long formula may repeat it thousands of times)
  const refuse = (key: string, offset: number, length: number, message: () => string, hint: () => string) => {
    if (seen.has(key)) return;
    seen.add(key);
    const h = hint();
    const issue: Issue = { code: 'AMBIGUOUS_READING', message: message(), column: columnOf(input, offset), length, hint: h };
    if (h.includes('`abbreviations')) issue.options = ['abbreviations'];
    issues.push(issue);
  };
  eachLevel(components, (parts) => {
    for (const p of parts) {
      if (p.kind !== 'atom' || p.massNumber !== null) continue;
      const text = written(input, p);
      if (text !== p.symbol) continue;
      if ((p.symbol === 'Ac' || p.symbol === 'Ts') && symbols.size === 1 && components.length === 1) {
        if (!seen.has(p.symbol)) {
          seen.add(p.symbol);
          notes.push({ code: 'ELEMENT_NOT_ABBREVIATION', message: `'${p.symbol}' alone is read as the element ${p.symbol === 'Ac' ? 'actinium' : 'tennessine'}, not ${ABBREVIATIONS[p.symbol].name}`, column: columnOf(input, p.span.start) });
        }
      } else if (p.symbol === 'Ac' || p.symbol === 'Ts') {
        const a = ABBREVIATIONS[p.symbol];
        const element = p.symbol === 'Ac' ? 'actinium' : 'tennessine';
        const nuclide = p.symbol === 'Ac' ? '[227Ac]' : '[294Ts]';
        refuse(p.symbol, p.span.start, 2, () => `'${p.symbol}' could be ${a.name} (${a.formula}) or the element ${element}, which has no standard atomic weight${named}`,
          () => `to read ${p.symbol} as ${a.name}, ${HOW_TO_ABBREVIATE}; for ${element}, write the nuclide: ${replaceSymbol(input, p.symbol, nuclide)}`);
      } else if (p.symbol === 'Pr' && !seen.has('Pr') && !praseodymiumFits(parts)) {
        refuse('Pr', p.span.start, 2, () => `'Pr' could be propyl (C3H7) or the element praseodymium; beside these symbols it reads as an organic formula`,
          () => `to read Pr as propyl, write nPr or iPr (${replaceSymbol(input, 'Pr', 'nPr')}) or ${HOW_TO_ABBREVIATE}; for praseodymium, write its one nuclide: ${replaceSymbol(input, 'Pr', '[141Pr]')}`);
      } else if (p.symbol === 'Np' && !seen.has('Np')) {
        seen.add('Np');
        notes.push({ code: 'ELEMENT_NOT_ABBREVIATION', message: "'Np' is read as the element neptunium; for naphthyl (C10H7) or neopentyl (C5H11) write the formula", column: columnOf(input, p.span.start) });
      } else if ((p.symbol === 'Ar' || p.symbol === 'Am') && symbols.size > 1 && !seen.has(p.symbol)) {
        // beside other atoms, Ar is often an aryl group and Am an amyl group (common practice): neither is one formula
        seen.add(p.symbol);
        const message =
          p.symbol === 'Ar'
            ? "'Ar' is read as the element argon; Ar for an aryl group stands for no one formula: write the aryl group's formula"
            : "'Am' is read as the element americium; for an amyl (pentyl) group write the formula (C5H11)";
        notes.push({ code: 'ELEMENT_NOT_ABBREVIATION', message, column: columnOf(input, p.span.start) });
      }
    }
    for (const run of runsOf(parts, input)) {
      const hasIsotope = /[DT]/.test(run.text);
      if (!run.counted && Object.hasOwn(MIXTURE_RUNS, run.text)) {
        const m = mixtureIssue(run, input);
        refuse(`run:${run.text}`, run.start, run.text.length, () => m.message, () => m.hint!);
        continue;
      }
      const name = run.counted ? null : nameFor(run.text);
      if (name && name.formula !== run.text) {
        const elements = run.atoms.map((a) => written(input, a)).join(', ');
        const other = hasIsotope ? asElementsText(run.text) : [...run.atoms.map((a) => written(input, a))].sort().join('');
        refuse(`run:${run.text}`, run.start, run.text.length, () => `'${run.text}' reads as the elements ${elements}, but ${run.text} is also the abbreviation for ${name.name} (${name.formula})`,
          () => `for ${name.name}, write ${name.formula} or ${HOW_TO_ABBREVIATE}; for the elements, write ${other}${hasIsotope ? ' (hydrogen isotopes in brackets)' : ' (another order)'}`);
        continue;
      }
      for (const g of GROUP_RUNS) {
        const at = run.text.indexOf(g);
        if (at < 0) continue;
        const a = ABBREVIATIONS[g];
        refuse(`group:${g}`, run.start + at, g.length, () => `'${g}' reads as the elements ${g.split('').join(', ')} (with tritium), but ${g} is also the abbreviation for ${a.name} (${a.formula})`,
          () => `for ${a.name}, write ${a.formula} or ${HOW_TO_ABBREVIATE}; for the elements, write ${asElementsText(g)}`);
        break;
      }
      if (/^BOC/.test(run.text)) {
        refuse('BOC', run.start, 3, () => "'BOC' reads as the elements B, O, C, but is also a spelling of Boc, tert-butoxycarbonyl (C5H9O2)",
          () => `for the Boc group write Boc (${replaceSymbol(input, 'BOC', 'Boc')}); for the elements, write them in another order (CBO)`);
      }
    }
  });
  if (issues.length === 0) {
    // one abbreviation alone (Ph3, Bn) may be a slip of case for the elements (PH3, BN); several
    // (PhBpin) spell no formula anyone means in capitals
    const onlyGroups = components.length === 1 && components[0].parts.length === 1 && components[0].parts.every((p) => p.kind === 'group' && p.abbreviation);
    const upper = input.trim().toUpperCase();
    const capitalised = /^[A-Z]/.test(input.trim()) && !/[DT]/.test(upper); // not thf → THF (tritium), cod → COD
    if (onlyGroups && capitalised && upper !== input.trim() && /^[A-Z0-9]+$/.test(upper) && readsAsElements(upper.replace(/[0-9]+/g, ''))) {
      notes.push({ code: 'CASE_CHECK', message: `'${input.trim()}' is read as abbreviations only; if you meant the elements, write '${upper}'` });
    }
  }
  return { issues, notes };
}

/**
 * A quick test the fast path uses: true when the text may hold a letter run that settleReadings
 * looks at (three capitals in a row, or a name such as PHEN), so that the full parser should read it.
 *
 * @example
 * mayNeedSettling('NBS') // true
 * mayNeedSettling('CH3COOH') // false
 */
export function mayNeedSettling(text: string): boolean {
  return NAME_TEST.test(text);
}

const NAME_TEST = new RegExp(
  [...Object.keys(REAGENTS).filter((k) => /^[A-Z]+$/.test(k)), ...Object.keys(SOLVENTS).filter((k) => /^[a-z]+$/.test(k)).map((k) => k.toUpperCase()), ...GROUP_RUNS, ...MIXED_CASE_RUNS, ...Object.keys(MIXTURE_RUNS), 'BOC', 'NCS', 'SIPr', 'IMes'].join('|'),
);
