// Inputs for the fuzz harness: formulas built from real pieces, then mutated; hostile text;
// numbers at the edges; KEY=VALUE sets, equations, quantities and JSON lines.
import fc from 'fast-check';

const SYMBOLS = ['C', 'H', 'N', 'O', 'S', 'P', 'F', 'Cl', 'Br', 'I', 'Na', 'K', 'Ca', 'Mg', 'Fe', 'Cu', 'Zn', 'Pd', 'Pt', 'Sn', 'Pr', 'Ac', 'Ts', 'Co', 'D', 'T', 'Xx', 'nb', 'pb', 'PB'];
const ABBREVIATIONS = ['Me', 'Et', 'Ph', 'Bu', 'tBu', 'Boc', 'Cp', 'Cp*', 'Py', 'py', 'OAc', 'AcOH', 'THF', 'COD', 'dba', 'Ts', 'OTf', 'TMS'];
const JOINERS = ['·', '.', '*', ' ', '•', '+', '-', '^', '^2+', '^-', '²⁻', '⁺', '(s)', '(aq)', '½', '1/2', '0.5', '(', ')', '[', ']', '{', '}', '[13C]', '[2H]', '¹³', '₂', '\u0000', '\u001b[31m', '\r', '\t', '💧', '__proto__', 'constructor', '=', '->', '→', ','];
const NUMBERS = ['0', '1', '2', '12', '0.5', '1.25', '007', '1e3', '1e309', '1e-400', '-1', '99999999999999999999', '3.0000000000000000001', 'NaN', 'Infinity', '1,5', '1_000', '١٢'];
const UNITS = ['', ' g', ' mg', ' kg', ' mL', ' L', ' µL', ' M', ' mM', ' mol', ' mmol', ' %', ' ppm', ' g/L', ' g/100 mL', ' mg/mL', ' equiv', ' mol%', ' parsec', 'g'];

const piece = fc.oneof(
  { weight: 5, arbitrary: fc.constantFrom(...SYMBOLS) },
  { weight: 2, arbitrary: fc.constantFrom(...ABBREVIATIONS) },
  { weight: 3, arbitrary: fc.constantFrom(...NUMBERS.slice(0, 7)) },
  { weight: 2, arbitrary: fc.constantFrom(...JOINERS) },
);

/** A formula-like text: real pieces, sometimes with a slip of case or a piece dropped. */
export const formulaText = fc
  .tuple(fc.array(piece, { minLength: 1, maxLength: 14 }), fc.constantFrom('none', 'lower', 'upper', 'drop', 'repeat'))
  .map(([pieces, mutation]) => {
    let s = pieces.join('');
    if (mutation === 'lower') s = s.toLowerCase();
    else if (mutation === 'upper') s = s.toUpperCase();
    else if (mutation === 'drop' && s.length > 1) s = s.slice(0, s.length >> 1) + s.slice((s.length >> 1) + 1);
    else if (mutation === 'repeat') s = s.repeat(3);
    return s;
  });

/** Any text at all, short. */
export const anyText = fc.oneof(fc.string({ maxLength: 30 }), fc.string({ unit: 'grapheme', maxLength: 12 }), fc.constantFrom('', ' ', '-', '--', '--help', '__proto__', '\u0000', '\ufeffH2O', 'H2O\r'));

/** A quantity with a unit, sometimes absurd. */
export const quantityText = fc.tuple(fc.constantFrom(...NUMBERS), fc.constantFrom(...UNITS)).map(([n, u]) => n + u);

/** A measurement set such as 'C=40.00 H=6.71 O=rest'. */
export const keyValueSet = fc
  .array(fc.tuple(fc.constantFrom('C', 'H', 'N', 'O', 'S', 'Cl', 'Na2O', 'Fe2O3', 'sample', 'Xx', '__proto__', ''), fc.oneof(fc.constantFrom(...NUMBERS), fc.constantFrom('rest', '40.00', '6.71', '53.29', '12.5 g', ''))), { minLength: 1, maxLength: 6 })
  .chain((pairs) => fc.constantFrom(' ', ',', ', ', '  ').map((sep) => pairs.map(([k, v]) => `${k}=${v}`).join(sep)));

/** An equation from formula texts. */
export const equationText = fc
  .tuple(fc.array(formulaText, { minLength: 1, maxLength: 3 }), fc.constantFrom(' -> ', ' = ', '→', ' + ', ''), fc.array(formulaText, { minLength: 0, maxLength: 3 }))
  .map(([l, arrow, r]) => `${l.join(' + ')}${arrow}${r.join(' + ')}`);

/** A calculator expression. */
export const expressionText = fc
  .array(fc.oneof(quantityText, fc.constantFrom('*', '/', '+', '-', '(', ')', ' to g', ' to mL', 'M(H2O)', 'M(', '±', ' ± 0.05', '^2', '100 %', '1:1000')), { minLength: 1, maxLength: 8 })
  .map((a) => a.join(' '));

/** A JSON line with values of every type. */
export const jsonLine = fc
  .dictionary(fc.constantFrom('C', 'H', 'O', 'N', 'sample', 'molarMass', '__proto__', 'toString'), fc.oneof(fc.double(), fc.string({ maxLength: 6 }), fc.constant(null), fc.constant({ toString: 'x' }), fc.array(fc.integer(), { maxLength: 2 }), fc.boolean()), { maxKeys: 5 })
  .map((o) => JSON.stringify(o));

/** Text a spreadsheet would run as a formula, or a terminal would obey: for ids, cells and inputs. */
export const hostileCell = fc.constantFrom(
  '=HYPERLINK("http://evil.example","x")',
  '=1+1',
  '@SUM(A1:A2)',
  '+1+1',
  '-2+3',
  '-cmd|calc',
  '\t=1',
  '\r=1',
  'JK-9 fails\rJK-9 passes',
  'MK-1\u001b[2J\u001b[1;1HMK-1 passes',
  'bell\u0007',
  'back\bspace',
  'C1\u009bcontrol',
  'x\u202eright-to-left',
  '__proto__',
  'constructor',
);

/** A CSV cell: quoted, with quotes doubled, so any text (line ends too) stays one cell. */
const csvCell = (s: string) => `"${s.replace(/"/g, '""')}"`;

/** A lab sheet for `analysis --sheet`: hostile ids, real and broken formulas and found values. */
export const labSheet = fc
  .array(fc.tuple(fc.oneof(hostileCell, anyText), fc.oneof(formulaText, fc.constantFrom('C20H25N3O', 'C9H8O4')), fc.array(fc.oneof(fc.constantFrom('72.30', '7.91', '12.60', '', 'x', '1e309', '-0.39', '74.27 N=12.99'), anyText), { minLength: 3, maxLength: 3 })), { minLength: 1, maxLength: 5 })
  .map((rows) => ({ text: 'id,formula,C,H,N\n' + rows.map(([id, f, found]) => [id, f, ...found].map(csvCell).join(',') + '\n').join(''), rows: rows.length }));

/** A measurement sheet for `empirical --sheet`. */
export const measurementSheet = fc
  .array(fc.tuple(fc.oneof(hostileCell, anyText), fc.array(fc.oneof(fc.constantFrom('40.00', '6.71', '53.29', 'rest', '', '1e309'), anyText), { minLength: 3, maxLength: 3 })), { minLength: 1, maxLength: 4 })
  .map((rows) => ({ text: 'id,C,H,O\n' + rows.map(([id, v]) => [id, ...v].map(csvCell).join(',') + '\n').join(''), rows: rows.length }));

/** An ion sheet for `ion --sheet`. */
export const ionSheet = fc
  .array(fc.tuple(fc.oneof(hostileCell, anyText), fc.oneof(formulaText, fc.constant('C15H15NO2')), fc.oneof(fc.constantFrom('[M+H]+', '[M+Na]+', '', '[M'), hostileCell), fc.oneof(fc.constantFrom('242.1172', '', 'x', '1e309'), hostileCell)), { minLength: 1, maxLength: 4 })
  .map((rows) => ({ text: 'id,formula,ion,found\n' + rows.map((r) => r.map(csvCell).join(',') + '\n').join(''), rows: rows.length }));
