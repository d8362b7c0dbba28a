import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { prepRow, readPrepSheet } from '../../src/preparation/prep-sheet.js';
import { prepareSolution } from '../../src/preparation/solution.js';
import { concentratedReagent } from '../../src/preparation/concentrated.js';
import { displayInstruction, displayResult } from '../../src/sigfig/instruction.js';

describe('prep sheets', () => {
  it('reads the columns by name, a form column giving the formula of a named reagent', () => {
    const rows = readPrepSheet('ID,Reagent,Form,Purity,Target,Volume\nP-1,copper(II) sulfate,CuSO4·5H2O,98.5 %,0.100 M,250.0 mL\n');
    expect(rows[0]).toMatchObject({ id: 'P-1', reagent: 'copper(II) sulfate', formula: 'CuSO4·5H2O', purity: '98.5 %', target: '0.100 M', volume: '250.0 mL', line: 2 });
  });

  it('a solid row weighs, a row with a density measures a volume of concentrated reagent', () => {
    const [a, b] = readPrepSheet('reagent,form,purity,density,target,volume\ncopper sulfate,CuSO4·5H2O,98.5 %,,0.100 M,250.0 mL\nhydrochloric acid,HCl,37 %,1.19 g/mL,1.00 M,500.0 mL\n');
    const pa = prepRow(a);
    const pb = prepRow(b);
    expect(pa.kind === 'solid' && displayInstruction(pa.solution.mass!, 'g').text).toBe('6.337 g');
    expect(pb.kind === 'concentrated' && displayInstruction(pb.concentrated.take!, 'mL').text).toBe('41.40 mL');
  });

  it('back-calculates the concentration made from the mass weighed (a result)', () => {
    // 2.0437 g × 99.95 % ÷ 204.22 g/mol ÷ 0.1000 L = 0.1000 M (KHP, the primary standard of OpenStax Chemistry 2e §4.5 examples; from memory)
    const [row] = readPrepSheet('reagent,purity,target,volume,weighed\nKHC8H4O4,99.95 %,0.1000 M,100.0 mL,2.0437 g\n');
    const p = prepRow(row);
    expect(p.kind === 'solid' && displayResult(p.solution.made!, 'M').text).toBe('0.1000 M');
  });

  it('a bad row is refused alone, with what is missing', () => {
    const rows = readPrepSheet('reagent,target,volume\nNaCl,0.100 M,250.0 mL\nNaCl,,250.0 mL\nXx,0.1 M,1 L\n');
    expect(() => prepRow(rows[0])).not.toThrow();
    expect(() => prepRow(rows[1])).toThrow(/no target/);
    expect(() => prepRow(rows[2])).toThrow();
  });

  it('refuses a sheet without a target or volume column', () => {
    expect(() => readPrepSheet('reagent,volume\nNaCl,1 L\n')).toThrow(/target/);
  });

  it('property: each row of a sheet gives exactly what prepare gives for the same reagent, purity, target and volume', () => {
    const solids = ['NaCl', 'KCl', 'CuSO4·5H2O', 'CaCl2·2H2O', 'KHC8H4O4', 'Na2CO3', 'MgSO4·7H2O'];
    const liquids: [string, string, string][] = [['HCl', '37 %', '1.19 g/mL'], ['H2SO4', '96 %', '1.84 g/mL'], ['HNO3', '70 %', '1.42 g/mL'], ['NH3', '28 %', '0.90 g/mL']];
    const row = fc.oneof(
      fc.record({ kind: fc.constant('solid' as const), reagent: fc.constantFrom(...solids), purity: fc.constantFrom('', '98.5 %', '99.0 %', '99.95 %'), target: fc.constantFrom('0.100 M', '0.0500 M', '2.50 g/L', '0.9 % w/v', '1000 ppm'), volume: fc.constantFrom('100.0 mL', '250.0 mL', '1.000 L') }),
      fc.record({ kind: fc.constant('liquid' as const), liquid: fc.constantFrom(...liquids), target: fc.constantFrom('0.100 M', '1.00 M', '0.500 M'), volume: fc.constantFrom('100.0 mL', '500.0 mL', '1.000 L') }),
    );
    fc.assert(
      fc.property(fc.array(row, { minLength: 1, maxLength: 8 }), (specs) => {
        const lines = specs.map((s) => (s.kind === 'solid' ? `${s.reagent},${s.purity},,${s.target},${s.volume}` : `${s.liquid[0]},${s.liquid[1]},${s.liquid[2]},${s.target},${s.volume}`));
        const rows = readPrepSheet(`reagent,purity,density,target,volume\n${lines.join('\n')}\n`);
        expect(rows).toHaveLength(specs.length);
        specs.forEach((s, i) => {
          const p = prepRow(rows[i]);
          if (s.kind === 'solid') {
            const direct = prepareSolution(s.reagent, { concentration: s.target, volume: s.volume, purity: s.purity || undefined });
            expect(p.kind).toBe('solid');
            if (p.kind === 'solid') {
              expect(p.solution.mass!.quantity.value.eq(direct.mass!.quantity.value)).toBe(true);
              expect(p.solution.notes).toEqual(direct.notes);
            }
          } else {
            const direct = concentratedReagent(s.liquid[0], { fraction: s.liquid[1], density: s.liquid[2], concentration: s.target, volume: s.volume });
            expect(p.kind).toBe('concentrated');
            if (p.kind === 'concentrated') {
              expect(p.concentrated.take!.quantity.value.eq(direct.take!.quantity.value)).toBe(true);
              expect(p.concentrated.notes).toEqual(direct.notes);
            }
          }
        });
      }),
      { numRuns: 60 },
    );
  });
});

describe('a density on a reagent that is not a common concentrated grade', () => {
  it('names the reading: the purity column is read as a mass fraction of a liquid, not an assay', () => {
    const [nacl, hcl] = readPrepSheet('reagent,purity,density,target,volume\nNaCl,20.0 %,1.148 g/mL,0.100 M,1.000 L\nHCl,37 %,1.19 g/mL,1.00 M,500.0 mL\n');
    const r = prepRow(nacl);
    expect(r.kind).toBe('concentrated');
    const note = (r.kind === 'concentrated' ? r.concentrated.notes : []).find((n) => n.code === 'PURITY_AS_MASS_FRACTION')!;
    expect(note.message).toContain('NaCl is read as a liquid reagent (a solution) of 20.0 % w/w');
    expect(note.message).toContain('leave the density empty');
    // 37 % HCl is a grade of the table: its reading as a liquid needs no such note
    const h = prepRow(hcl);
    expect((h.kind === 'concentrated' ? h.concentrated.notes : []).map((n) => n.code)).not.toContain('PURITY_AS_MASS_FRACTION');
  });

  it('a fraction no solution of the reagent reaches is refused with both readings: 99.5 % NaCl with a density', () => {
    // saturated NaCl at 20 °C: 35.9 g per 100 g of water, 26.4 % w/w (CRC Handbook, from memory)
    const [row] = readPrepSheet('reagent,purity,density,target,volume\nNaCl,99.5 %,2.16 g/mL,0.100 M,250.0 mL\n');
    expect(() => prepRow(row)).toThrow(/reads two ways: as a solution of 99\.5 % w\/w, which no solution of it reaches \(saturated at about 26\.4 % w\/w.*or as the solid with an assay of 99\.5 %/);
    // a brine below saturation is a liquid reagent: 20.0 % w/w, 1.148 g/mL is 3.929 M; 0.02500 mol ÷ 3.929 M = 6.363 mL
    const [brine] = readPrepSheet('reagent,purity,density,target,volume\nNaCl,20.0 %,1.148 g/mL,0.100 M,250.0 mL\n');
    const r = prepRow(brine);
    expect(r.kind === 'concentrated' ? displayInstruction(r.concentrated.take!, 'mL').text : '').toBe('6.363 mL');
  });

  it('a refusal for a missing density names no other substance’s density', () => {
    expect(() => concentratedReagent('H2O2', { fraction: '30 %' })).toThrow(/give the density of H2O2 at 30 %, from the label or certificate of the bottle \(`density: '… g\/mL'`\)/);
  });
});
