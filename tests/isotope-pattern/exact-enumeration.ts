import { naturalIsotopes } from '../../src/elements/nuclides.js';

/** Every isotopologue of a small formula, by adding one atom at a time (no pruning, no shortcuts). */
export function enumerateIsotopologues(atoms: Record<string, number>): { key: string; mass: number; p: number; nominal: number }[] {
  let states = new Map<string, { mass: number; p: number; nominal: number }>([['', { mass: 0, p: 1, nominal: 0 }]]);
  for (const [symbol, n] of Object.entries(atoms)) {
    const iso = naturalIsotopes(symbol);
    const total = iso.reduce((s, i) => s + Number(i.abundance), 0);
    for (let a = 0; a < n; a++) {
      const next = new Map<string, { mass: number; p: number; nominal: number }>();
      for (const [key, s] of states) {
        for (const i of iso) {
          // the composition key: counts of each nuclide, sorted, so that orderings merge
          const counts = new Map<string, number>(key === '' ? [] : key.split(',').map((kv) => [kv.split(':')[0], Number(kv.split(':')[1])] as [string, number]));
          const id = `${i.massNumber}${symbol}`;
          counts.set(id, (counts.get(id) ?? 0) + 1);
          const k = [...counts].sort().map(([x, c]) => `${x}:${c}`).join(',');
          const prev = next.get(k);
          const p = s.p * (Number(i.abundance) / total);
          if (prev) prev.p += p;
          else next.set(k, { mass: s.mass + Number(i.mass), p, nominal: s.nominal + i.massNumber });
        }
      }
      states = next;
    }
  }
  return [...states].map(([key, s]) => ({ key, ...s }));
}
