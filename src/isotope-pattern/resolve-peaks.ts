/**
 * What an instrument of a given resolving power shows: isotopologues closer together than the
 * peak width merge into one peak. pondus takes the width as the full width at half maximum,
 * FWHM = m/R at the peaks' m/z (the usual definition of resolving power, R = m/Δm at FWHM), and
 * merges neighbours (sorted by m/z) whose separation is below the FWHM, chaining through a run
 * of close neighbours. A merged peak sits at the abundance-weighted centroid of its members and
 * holds their summed abundance, as a centroided spectrum reports it.
 */
import { fail } from '../errors/pondus-error.js';

/** A stick of a spectrum. */
export interface Stick {
  mz: number;
  abundance: number;
  /** The most abundant member's label (heavy isotopes), or null when not known. */
  label: string | null;
  /** How many isotopologues it holds. */
  members: number;
}

/**
 * Merges sticks closer than FWHM = m/R. Sticks come in any order; they go out by m/z.
 *
 * @param sticks - the sticks (m/z, abundance, label, members), in any order.
 * @param resolvingPower - the resolving power R (m/Δm at half height).
 * @returns the merged peaks by m/z, each at the abundance-weighted mean m/z of its members, with their summed abundance and the most abundant member's label.
 * @throws PondusError: BAD_OPTION for a resolving power outside 1 to 10^8; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * resolvePeaks([{ mz: 100, abundance: 1, label: '', members: 1 }, { mz: 100.0005, abundance: 1, label: 'x', members: 1 }], 100000).length // 1
 */
export function resolvePeaks(sticks: readonly Stick[], resolvingPower: number): Stick[] {
  if (!(resolvingPower >= 1 && resolvingPower <= 1e8)) throw fail({ code: 'BAD_OPTION', message: `the resolving power is a number from 1 to 10^8 (such as 60000), not ${resolvingPower}` });
  const sorted = [...sticks].sort((a, b) => a.mz - b.mz);
  const out: Stick[] = [];
  let group: Stick[] = [];
  const flush = () => {
    if (group.length === 0) return;
    let a = 0;
    let am = 0;
    let top = group[0];
    let members = 0;
    for (const s of group) {
      a += s.abundance;
      am += s.abundance * s.mz;
      members += s.members;
      if (s.abundance > top.abundance) top = s;
    }
    out.push({ mz: a > 0 ? am / a : group[0].mz, abundance: a, label: top.label, members });
    group = [];
  };
  for (const s of sorted) {
    const prev = group[group.length - 1];
    if (prev && s.mz - prev.mz >= prev.mz / resolvingPower) flush();
    group.push(s);
  }
  flush();
  return out;
}
