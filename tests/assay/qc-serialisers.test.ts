// titration and sample-basis: the CLI prints exactly the library's serialisers, called with the
// command line's naming of options (its notes say --ratio where the library says `ratio`).
import { describe, expect, it } from 'vitest';
import * as api from '../../src/index.js';
import { withNaming } from '../../src/errors/message.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import { pondus } from '../cli/run-cli.js';

const line = (row: unknown) => `${JSON.stringify({ line: 1, ...(row as object) })}\n`;
const titration = { sample: '0.5000 g', titrant: '0.1000 M', volume: '24.40 mL' };

describe('the CLI prints exactly the titration and sample-basis serialisers', () => {
  it('titration, as is', () => {
    const t = api.titrationAssay('KHC8H4O4', titration);
    const out = pondus(['titration', '--json', 'KHC8H4O4', '--sample', '0.5000 g', '--titrant', '0.1000 M', '--volume', '24.40 mL']).stdout;
    expect(out).toBe(line(withNaming(FLAG_NAMING, () => api.titrationJson(t, api.reportOnBasis(t.assay, 'as-is', 'as-is'), 'KHC8H4O4'))));
  });

  it('titration on the dried basis against limits', () => {
    const t = api.titrationAssay('KHC8H4O4', titration);
    const rep = api.reportOnBasis(t.assay, 'as-is', 'dried', { loss: '0.20 %', limits: '99.0-101.0', inferred: true });
    const out = pondus(['titration', '--json', 'KHC8H4O4', '--sample', '0.5000 g', '--titrant', '0.1000 M', '--volume', '24.40 mL', '--loss', '0.20 %', '--limits', '99.0-101.0']).stdout;
    expect(out).toBe(line(withNaming(FLAG_NAMING, () => api.titrationJson(t, rep, 'KHC8H4O4'))));
    // source: the dried basis divides by (1 − loss): 99.66 % / 0.998 = 99.86 % (arithmetic by hand)
    expect((api.titrationJson(t, rep, 'KHC8H4O4').reported as { figure: string }).figure).toBe('99.86');
  });

  it('sample-basis', () => {
    const v = api.quantity(api.readNumber('0.991'), null);
    const cli = JSON.parse(pondus(['sample-basis', '--json', '99.1 %', '--from', 'as-is', '--to', 'dried', '--loss', '0.50 %']).stdout) as { converted: { figure: string }; to: string };
    expect(cli.to).toBe('dried');
    // source: 99.1 % / (1 − 0.0050) = 99.60 % (arithmetic by hand)
    expect(cli.converted.figure).toBe('99.6');
    expect((api.sampleBasisJson(v, 'as-is', api.reportOnBasis(v, 'as-is', 'dried', { loss: '0.50 %' }), [], '99.1 %').converted as { display: string }).display).toBe('99.6 %');
  });

  it('refuses results of the wrong shape by name', () => {
    let code = '';
    try {
      api.titrationJson({} as never, {} as never, 'x');
    } catch (e) {
      if (e instanceof api.PondusError) code = e.first.code;
    }
    expect(code).toBe('BAD_ARGUMENT');
  });
});
