/**
 * ln(n!) for the multinomial probabilities of isotope configurations: summed exactly from a
 * table below 1024, by Stirling's series above (error below 1e-15 relative there).
 */
const TABLE_SIZE = 1024;
let table: Float64Array | null = null;

/**
 * The natural logarithm of n factorial.
 *
 * @example
 * Math.round(Math.exp(logFactorial(5))) // 120
 */
export function logFactorial(n: number): number {
  if (n < TABLE_SIZE) {
    if (!table) {
      table = new Float64Array(TABLE_SIZE);
      for (let i = 2; i < TABLE_SIZE; i++) table[i] = table[i - 1] + Math.log(i);
    }
    return table[n];
  }
  const x = n + 1;
  // ln Γ(x) = (x − ½) ln x − x + ½ ln 2π + 1/(12x) − 1/(360x³) + 1/(1260x⁵)
  const x2 = x * x;
  return (x - 0.5) * Math.log(x) - x + 0.5 * Math.log(2 * Math.PI) + 1 / (12 * x) - 1 / (360 * x * x2) + 1 / (1260 * x * x2 * x2);
}
