/**
 * Dilution, C1·V1 = C2·V2: the volume of stock to take for a final volume of
 * a weaker solution.
 */
import type { Note } from '../errors/issue.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { MASS_CONCENTRATION, MOLARITY, PURE, VOLUME, measureAs } from '../calc/measure.js';
import { divide, multiply, subtract, type Quantity } from '../sigfig/quantity.js';
import { sameDims } from '../sigfig/units.js';

export interface DilutionResult {
  stock: Quantity;
  target: Quantity;
  finalVolume: Quantity;
  /** Volume of stock to take. */
  stockVolume: Quantity;
  /** Volume of solvent to make up with (approximately: volumes need not be additive). */
  solventVolume: Quantity;
  /** The dilution factor C1/C2. */
  factor: Quantity;
  notes: Note[];
}

/**
 * The stock volume for a dilution.
 *
 * @example
 * dilute('1.00 M', '0.100 M', '250.0 mL').stockVolume // 25.0 mL
 */
export function dilute(stockText: string, targetText: string, volumeText: string): DilutionResult {
  const kinds = [MOLARITY, MASS_CONCENTRATION, PURE];
  const notes: Note[] = [];
  const stock = measureAs(stockText, kinds, 'the stock concentration', notes);
  const target = measureAs(targetText, kinds, 'the target concentration', notes);
  if (!sameDims(stock.dims, target.dims)) throw fail({ code: 'INCOMPATIBLE_UNITS', message: 'the stock and target concentrations must be of the same kind (both molar, both mass per volume, or both %)' });
  const finalVolume = measureAs(volumeText, [VOLUME], 'the final volume', notes);
  if (stock.value.lte(0) || target.value.lte(0) || finalVolume.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'concentrations and volume must be positive' });
  if (target.value.gt(stock.value)) throw fail({ code: 'BAD_AMOUNT', message: 'the target is more concentrated than the stock: a dilution cannot get there' });
  const stockVolume = divide(multiply(target, finalVolume), stock);
  stockVolume.unit = finalVolume.unit;
  const solventVolume = subtract(finalVolume, stockVolume);
  return { stock, target, finalVolume, stockVolume, solventVolume, factor: divide(stock, target), notes };
}

/** Non-throwing {@link dilute}. */
export function safeDilute(stock: string, target: string, volume: string): SafeResult<DilutionResult> {
  return toSafe(() => dilute(stock, target, volume));
}
