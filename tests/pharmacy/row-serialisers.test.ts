// The compounding and QC commands' rows are written by one serialiser each in the library: the CLI's JSON
// row is exactly the serialiser fed the plain result (plus the writer's `line`), called with the
// command line's naming of options (its notes say --measured where the library says `measured`),
// and the public serialisers refuse what is not their result with BAD_ARGUMENT.
import { describe, expect, it } from 'vitest';
import * as api from '../../src/index.js';
import { withNaming } from '../../src/errors/message.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import { PondusError } from '../../src/errors/pondus-error.js';
import { pondus } from '../cli/run-cli.js';

const line = (row: unknown) => `${JSON.stringify({ line: 1, ...(row as object) })}\n`;

describe('the CLI prints exactly the library serialiser', () => {
  it.each([
    ['meq', ['KCl', '--mass', '1.000 g'], () => api.meqJson(api.milliequivalents('KCl', { mass: '1.000 g' }), 'KCl')],
    ['meq for a target', ['KCl', '--meq', '20 mEq'], () => api.meqJson(api.milliequivalents('KCl', { meq: '20 mEq' }), 'KCl')],
    ['meq of a strength', ['KCl', '--concentration', '14.9 % w/v'], () => api.meqJson(api.milliequivalents('KCl', { concentration: '14.9 % w/v' }), 'KCl')],
    ['osmolarity', ['NaCl=0.9 %, KCl=0.03 %'], () => api.osmolarityJson(api.osmolarity('NaCl=0.9 %, KCl=0.03 %'), 'NaCl=0.9 %, KCl=0.03 %')],
    ['osmolarity with a non-electrolyte', ['C6H12O6=5 %, NaCl=0.45 %'], () => api.osmolarityJson(api.osmolarity('C6H12O6=5 %, NaCl=0.45 %'), 'C6H12O6=5 %, NaCl=0.45 %')],
    ['alligation', ['10 %', '--higher', '20 %', '--lower', '5 %', '--total', '300 g'], () => api.alligationJson(api.alligation('10 %', { higher: '20 %', lower: '5 %', total: '300 g' }), '10 %')],
    ['potency', ['98.5 %', '--need', '250 mg'], () => api.potencyJson(api.potency('98.5 %', { need: '250 mg' }), '98.5 %', 'half-even', '250 mg')],
    ['strength', ['1:750'], () => api.strengthJson(api.strengthForms('1:750'), '1:750')],
    ['standardise', ['KHC8H4O4', '--mass', '0.5105 g', '--volume', '24.95 mL'], () => api.standardiseJson(api.standardise('KHC8H4O4', { mass: '0.5105 g', volume: '24.95 mL' }), 'KHC8H4O4')],
    ['replicates', ['99.1, 99.4, 99.2'], () => api.replicatesJson(api.replicates('99.1, 99.4, 99.2'), '99.1, 99.4, 99.2')],
    ['replicates half-up', ['--rounding', 'half-up', '99.1, 99.4, 99.2'], () => api.replicatesJson(api.replicates('99.1, 99.4, 99.2', { rounding: 'half-up' }), '99.1, 99.4, 99.2')],
  ] as const)('%s', (_, args, row) => {
    const command = _.split(' ')[0];
    const out = pondus([command, '--json', ...args]).stdout;
    expect(out).toBe(line(withNaming(FLAG_NAMING, row)));
  });

  it('follows the rounding given', () => {
    const r = api.milliequivalents('KCl', { mass: '1.000 g' });
    expect(pondus(['meq', '--json', '--rounding', 'half-up', 'KCl', '--mass', '1.000 g']).stdout).toBe(line(api.meqJson(r, 'KCl', 'half-up')));
  });

  it('writes mEq and mOsm as amounts held in Eq and Osm', () => {
    // source: 1 g KCl (M 74.55 g/mol, CIAAW 2021) is 13.41 mmol = 13.41 mEq = 26.83 mOsm (arithmetic by hand)
    const row = api.meqJson(api.milliequivalents('KCl', { mass: '1.000 g' }), 'KCl') as { meq: { unit: string; display: string }; mOsm: { unit: string; display: string } };
    expect(row.meq).toMatchObject({ unit: 'Eq', display: '13.41 mEq' });
    expect(row.mOsm).toMatchObject({ unit: 'Osm', display: '26.83 mOsm' });
  });
});

describe('the public serialisers refuse what is not their result', () => {
  const code = (f: () => unknown) => {
    try {
      f();
    } catch (e) {
      return e instanceof PondusError ? e.first.code : 'not a PondusError';
    }
    return null;
  };
  it.each([
    ['meqJson', () => api.meqJson(api.osmolarity('NaCl=0.9 %') as never, 'x')],
    ['meqJson without its input', () => api.meqJson(api.milliequivalents('KCl', { mass: '1.000 g' }), undefined as never)],
    ['osmolarityJson', () => api.osmolarityJson({ components: [], osmolarity: 5, ions: [], notes: [] } as never, 'x')],
    ['alligationJson', () => api.alligationJson({} as never, 'x')],
    ['potencyJson', () => api.potencyJson(api.potency('98.5 %'), '98.5 %', 'half-even', 250 as never)],
    ['strengthJson', () => api.strengthJson(api.strengthForms('1:750'), '1:750', 'up' as never)],
    ['standardiseJson', () => api.standardiseJson(api.replicates('99.1, 99.4, 99.2') as never, 'x')],
    ['replicatesJson', () => api.replicatesJson({ ...api.replicates('99.1, 99.4, 99.2'), sd: 1 } as never, 'x')],
  ])('%s: BAD_ARGUMENT', (_, f) => {
    expect(code(f)).toBe('BAD_ARGUMENT');
  });
});
