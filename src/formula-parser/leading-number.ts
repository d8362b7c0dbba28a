/**
 * A number written straight before an element at the start of a formula, or at the start of a
 * bracket, reads two ways when it is a mass number of that element: `13CO2` is 13 × CO2 or
 * carbon-13 dioxide, `2H2O` is 2 × H2O or ²H₂O, `[13C6]` is 13 × C6 or six carbon-13 atoms.
 * Such a formula is refused with both readings offered (the multiplier after a `·`, as in
 * `CaSO4·2H2O`, is read as written).
 */
import { getElement } from '../elements/element-table.js';
import { naturalIsotopes } from '../elements/nuclides.js';
import type { Issue } from '../errors/issue.js';
import { columnOf } from './prescan.js';
import type { ComponentNode, GroupNode } from './tree.js';

/** Mass numbers of the usual radiolabels, which have no natural abundance: tritium and carbon-14 (common practice). */
const RADIOLABELS: Readonly<Record<string, number>> = { H: 3, C: 14 };

/**
 * True when `n` is the mass number of a natural isotope of the element, or of tritium or carbon-14:
 * a number written straight before it at the start of a formula reads two ways.
 *
 * @example
 * isMassNumberOf('C', 13) // true
 * isMassNumberOf('Ca', 2) // false
 */
export function isMassNumberOf(symbol: string, n: number): boolean {
  return RADIOLABELS[symbol] === n || naturalIsotopes(symbol).some((i) => i.massNumber === n);
}

function nuclideName(symbol: string, n: number): string {
  const name = `${getElement(symbol)!.name}-${n}`;
  if (symbol === 'H' && n === 2) return `${name} (deuterium)`;
  return symbol === 'H' && n === 3 ? `${name} (tritium)` : name;
}

/**
 * The refusals of numbers that are both a multiplier and a mass number: at the start of the
 * formula and at the start of each bracket the user wrote.
 *
 * @param components - the formula's components, as the visitor built them.
 * @param text - the formula text.
 * @returns one AMBIGUOUS_READING issue per such number, with both readings in the hint; empty when there is none.
 * @example
 * leadingNumberIssues(parseFormula('H2O').components, 'H2O') // []
 */
export function leadingNumberIssues(components: ComponentNode[], text: string): Issue[] {
  const issues: Issue[] = [];
  const visit = (list: ComponentNode[], group: GroupNode | null) => {
    const first = list[0];
    const atom = first?.parts[0];
    const m = first?.multiplier;
    if (m && m.integer && atom?.kind === 'atom' && atom.massNumber === null && m.span.end === atom.span.start && isMassNumberOf(atom.symbol, Number(m.text))) {
      issues.push(issueFor(text, first, group));
    }
    for (const c of list) for (const p of c.parts) if (p.kind === 'group' && !p.abbreviation) visit(p.body, p);
  };
  visit(components, null);
  return issues;
}

function issueFor(text: string, c: ComponentNode, group: GroupNode | null): Issue {
  const m = c.multiplier!;
  const atom = c.parts[0] as Extract<ComponentNode['parts'][number], { kind: 'atom' }>;
  const n = Number(m.text);
  const symbol = atom.symbol;
  const rest = text.slice(m.span.end, c.span.end);
  const at = (from: number, to: number, by: string) => text.slice(0, from) + by + text.slice(to);
  // one nuclide with its count in a bracket of its own: [13C6] is [13C]6
  const alone = group && group.bracket === '[' && group.count === null && group.body.length === 1 && c.parts.length === 1 && atom.count;
  const label = alone ? at(group.span.start, group.span.end, `[${n}${symbol}]${atom.count!.text}`) : at(m.span.start, atom.span.start + symbol.length, `[${n}${symbol}]`);
  const times = c.parts.length === 1 && atom.count === null ? `${symbol}${n}` : `(${rest})${n}`;
  const multiplied = alone ? at(group.span.start, group.span.end, times) : at(m.span.start, c.span.end, times);
  return {
    code: 'AMBIGUOUS_READING',
    message: `the ${n} before ${rest} reads two ways: ${n} × ${rest}, or the mass number of ${nuclideName(symbol, n)}`,
    column: columnOf(text, m.span.start),
    length: atom.span.start + symbol.length - m.span.start,
    hint: `for ${nuclideName(symbol, n)} write ${label}; for ${n} × ${rest} write ${multiplied}`,
  };
}
