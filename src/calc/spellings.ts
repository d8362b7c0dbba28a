/**
 * What the calculator's tokens match that its fast reader needs too, without the parser library:
 * the molar mass of a formula, `M(…)`, and the unit spellings, longest first.
 */
import { unitSpellings } from '../sigfig/units.js';

/**
 * `M(CuSO4·5H2O)`: the molar mass of a formula, brackets inside it balanced.
 *
 * @example
 * matchFormulaMass('2 * M(Ca(OH)2)', 4)?.[0] // 'M(Ca(OH)2)'
 */
export function matchFormulaMass(text: string, offset: number): RegExpExecArray | null {
  if (text[offset] !== 'M' || text[offset + 1] !== '(') return null;
  let depth = 0;
  for (let i = offset + 1; i < text.length; i++) {
    const ch = text[i];
    if (ch === '(') depth++;
    else if (ch === ')') {
      depth--;
      if (depth === 0) return [text.slice(offset, i + 1)] as unknown as RegExpExecArray;
    }
  }
  return null;
}

let sorted: readonly string[] | undefined;

/**
 * Every spelling the unit table accepts, longest first: the order in which the Unit token tries
 * them, so `mol·L⁻¹` is one unit, not mol times something. Made on first use.
 *
 * @example
 * calcUnitSpellings().indexOf('mol·L⁻¹') < calcUnitSpellings().indexOf('mol') // true
 */
export function calcUnitSpellings(): readonly string[] {
  return (sorted ??= [...new Set(unitSpellings())].sort((a, b) => b.length - a.length));
}
