import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('echoed input cannot steer the terminal', () => {
  it('a carriage return or an escape sequence in an input is shown as ␦ in the table', () => {
    // a row id that would overwrite itself: "JK-9 fails" then CR then "JK-9 passes"
    const r = pondus(['mass', '-'], 'H2O\nJK-9 fails\rJK-9 passes\nNa\u001b[2JCl\n');
    expect(r.status).toBe(1);
    expect(r.stdout).not.toMatch(/[\r\u001b]/);
    expect(r.stdout).toContain('JK-9 fails␦JK-9 passes');
    expect(r.stdout).toContain('Na␦[2JCl');
    expect(r.stderr).not.toMatch(/[\r\u001b]/);
  });
});

describe('numbers a JSON number cannot carry are refused, never written as null', () => {
  it.each([
    ['1e309 mL'],
    ['1e-400 g'],
    ['1e99 g * 1e99 * 1e99 * 1e99'],
  ])('calc %s', (expr) => {
    const r = pondus(['calc', '--json', expr]);
    expect(r.status).toBe(1);
    expect(jsonLines(r.stdout)[0].error.code).toBe('NUMBER_OUT_OF_RANGE');
  });

  it('in a command reading a quantity too', () => {
    const r = pondus(['dilute', '--json', '1e309 mg/mL', '--to', '1.25 mg/mL', '--volume', '2 mL']);
    expect(jsonLines(r.stdout)[0].error.code).toBe('NUMBER_OUT_OF_RANGE');
  });
});
