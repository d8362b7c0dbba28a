/**
 * Found values of an elemental analysis: `C=72.30, H=7.91, N=12.60`.
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { isElementSymbol } from '../elements/element-table.js';

const ENTRY = /^([A-Z][a-z]?)\s*[=:]\s*([0-9]+(?:\.[0-9]+)?)\s*%?$/;

/**
 * Reads found mass percents; every symbol must be an element, every value 0–100.
 *
 * @example
 * readFound('C=72.30, H=7.91, N=12.60').get('C')?.toString() // '72.3'
 */
export function readFound(text: string): Map<string, Decimal> {
  const out = new Map<string, Decimal>();
  const entries = text.split(/[,;\s]+/).filter((s) => s !== '');
  if (entries.length === 0) throw fail({ code: 'BAD_MEASUREMENT', message: 'no found values: give them as C=72.30,H=7.91,N=12.60' }, text);
  let offset = 0;
  for (const e of entries) {
    const at = text.indexOf(e, offset);
    offset = at + e.length;
    const m = ENTRY.exec(e);
    const column = at + 1;
    if (!m) throw fail({ code: 'BAD_MEASUREMENT', message: `'${e}' is not a found value such as C=72.30`, column }, text);
    const [, symbol, value] = m;
    if (!isElementSymbol(symbol)) throw fail({ code: 'UNKNOWN_ELEMENT', message: `unknown element symbol '${symbol}'`, column }, text);
    const v = new Decimal(value);
    if (v.gt(100)) throw fail({ code: 'BAD_MEASUREMENT', message: `${symbol} found at ${value} %, over 100 %`, column }, text);
    if (out.has(symbol)) throw fail({ code: 'BAD_MEASUREMENT', message: `${symbol} is given twice`, column }, text);
    out.set(symbol, v);
  }
  const total = [...out.values()].reduce((a, b) => a.plus(b), new Decimal(0));
  if (total.gt(100.5)) throw fail({ code: 'BAD_MEASUREMENT', message: `the found values add up to ${total.toFixed()} %, over 100 %` }, text);
  return out;
}
