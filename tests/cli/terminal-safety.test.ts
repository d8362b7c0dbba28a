import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('echoed input cannot steer the terminal', () => {
  it('a carriage return or an escape sequence in an input is shown as ␦ in the table', () => {
    // a line that would overwrite itself: "JK-9 fails" then CR then "JK-9 passes"; a lone CR ends a
    // line, so these are two inputs, each on its own row
    const r = pondus(['mass', '-'], 'H2O\nJK-9 fails\rJK-9 passes\nNa\u001b[2JCl\n');
    expect(r.status).toBe(1);
    expect(r.stdout).not.toMatch(/[\r\u001b]/);
    expect(r.stdout).toMatch(/│ JK-9 fails +│/);
    expect(r.stdout).toMatch(/│ JK-9 passes +│/);
    expect(r.stdout).toContain('Na␦[2JCl');
    expect(r.stderr).not.toMatch(/[\r\u001b]/);
  });

  it('a lab-sheet id holding a CR cannot make a failing row read "passes"', () => {
    // the CR is inside a quoted CSV cell, so it stays in the id
    const sheet = 'id,formula,C,H,N\n"JK-9 fails\rJK-9 passes",C20H25N3O,72.30,7.91,12.60\n';
    const t = pondus(['analysis', '--sheet', '-'], sheet);
    expect(t.status).toBe(0);
    expect(t.stdout + t.stderr).not.toMatch(/[\r\u001b]/);
    expect(t.stdout).toContain('JK-9 fails␦JK-9 passes');
    const row = t.stdout.split('\n').find((l) => l.includes('JK-9 fails'))!;
    expect(row).toMatch(/│ fails +│/);
    expect(row).not.toMatch(/│ passes +│/);
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
