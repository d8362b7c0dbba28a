import { amountText } from '../formula/amount.js';
import type { CompositionResult } from './element-shares.js';

/** The stable JSON shape of a composition result (the `composition --json` contract). */
export interface CompositionJson {
  input: string;
  formula: string;
  molarMass: number;
  elements: { symbol: string; count: number; mass: number; massPercent: number }[];
  part?: { part: string; formula: string; count: number; mass: number; massPercent: number; countedFrom: string };
  notes?: string[];
}

/**
 * The JSON object `pondus composition --json` writes for one result.
 *
 * @example
 * compositionJson(composition('H2O')).elements[0].symbol // 'H'
 * String(compositionJson(composition('H2O')).elements[0].massPercent) // '11.19…'
 */
export function compositionJson(r: CompositionResult): CompositionJson {
  const o: CompositionJson = {
    input: r.input,
    formula: r.formula,
    molarMass: r.molarMass.toNumber(),
    elements: r.elements.map((e) => ({ symbol: e.symbol, count: Number(amountText(e.count)), mass: e.mass.toNumber(), massPercent: e.massPercent.toNumber() })),
  };
  if (r.part) {
    o.part = {
      part: r.part.part,
      formula: r.part.formula,
      count: Number(amountText(r.part.count)),
      mass: r.part.mass.toNumber(),
      massPercent: r.part.massPercent.toNumber(),
      countedFrom: r.part.countedFrom,
    };
  }
  if (r.notes.length > 0) o.notes = r.notes.map((n) => n.message);
  return o;
}
