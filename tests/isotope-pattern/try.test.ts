import { it } from 'vitest';
import { isotopePattern } from '../../src/isotope-pattern/pattern.js';
it('try', () => {
  for (const [f, o] of [['Cl2', {}], ['Br2', {}], ['CH2Cl2', {}], ['C60', {}], ['PdCl2', {}], ['C15H15NO2', { ion: '[M+H]+', resolvingPower: 60000 }], ['C15H15NO2', { kind: 'fine' }], ['[13C]6H12O6', {}]] as const) {
    const t0 = performance.now();
    const r = isotopePattern(f, o as any);
    console.log(f, (performance.now() - t0).toFixed(1), 'ms', r.coverage, r.averageMz, r.isotopeAverageMz, r.peaks.map((p) => `${p.mz.toFixed(4)}:${p.relative.toFixed(2)}${p.label ? ' ' + p.label : ''}`).join(' | '), r.notes.map((n) => n.code));
  }
  for (const [f, o] of [['C257H383N65O77S6', {}], ['C100H150N20O30S2', { kind: 'fine' }], ['C100H150N20O30S2', { kind: 'fine' }], ['C257H383N65O77S6', {}],['C257H383N65O77S6', { kind: 'fine' }]] as const) {
    const t0 = performance.now();
    const r = isotopePattern(f, o as any);
    console.log(f, o, (performance.now() - t0).toFixed(1), 'ms', r.allPeaks.length, r.coverage, r.averageMz, r.isotopeAverageMz);
  }
});
