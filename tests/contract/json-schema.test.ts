// The JSON contract, checked: every command's `--json` rows validate against its schema in
// schemas/<command>.schema.json (an ok row or an error row), over every example of the command's
// --help, the other option variants, and at least one failing input per command.
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { Ajv2020, type ValidateFunction } from 'ajv/dist/2020.js';
import { afterAll, describe, expect, it } from 'vitest';
import { HELP_EXAMPLES } from '../../src/cli/help-examples.js';
import { PRESENTERS } from '../../src/cli/commands/registry.js';
import { listedCommands, shellWords } from '../support/command-lines.js';
import { pondus } from '../cli/run-cli.js';

const SCHEMAS = fileURLToPath(new URL('../../schemas/', import.meta.url));
const ROOT = fileURLToPath(new URL('../../', import.meta.url));
/** Commands that print no result rows (no --json). */
const NO_ROWS = new Set(['help', 'completion', 'manual']);

const commandNames = listedCommands(NO_ROWS);

const ajv = new Ajv2020({ allErrors: true, strict: true });
ajv.addSchema(JSON.parse(readFileSync(`${SCHEMAS}common.schema.json`, 'utf8')));
const validators = new Map<string, ValidateFunction>();
function validatorOf(command: string): ValidateFunction {
  let v = validators.get(command);
  if (!v) {
    v = ajv.compile(JSON.parse(readFileSync(`${SCHEMAS}${command}.schema.json`, 'utf8')));
    validators.set(command, v);
  }
  return v;
}

/** Small sheets with a row that fails, written for the run (demonstration values). */
const SHEETS = mkdtempSync(join(tmpdir(), 'pondus-schema-'));
afterAll(() => rmSync(SHEETS, { recursive: true, force: true }));
const sheet = (name: string, text: string) => {
  writeFileSync(join(SHEETS, name), text);
  return join(SHEETS, name);
};
const ionSheet = sheet('ions.csv', 'id,formula,ion,found\nA1,C6H12O6,[M+Na]+,203.0526\nA2,Qq,[M+H]+,100\n');
const eaSheet = sheet('ea.csv', 'id,formula,C,H,N\nX1,C20H25N3O,72.30,7.91,12.60\nX2,Qq,1,1,1\n');
const prepSheet = sheet('prep.csv', 'id,reagent,form,purity,density,target,volume,weighed,taken\nP-01,sodium chloride,NaCl,99.5 %,,0.100 M,250.0 mL,,\nP-02,unknown,Qq,98.5 %,,0.100 M,250.0 mL,,\nP-03,sodium chloride,NaCl,,,,250.0 mL,1.461 g,\n');
const measSheet = sheet('measurements.csv', 'id,C,H,O\nS1,40.00,6.71,53.29\nS2,abc,6.71,53.29\n');

/**
 * Inputs beyond the --help examples: the option variants whose rows have another shape, and
 * inputs that fail (each command at least one). Fields: the command line, whether every row is an
 * error row (true), an ok row (false), or a mix (null), and the standard input for `-`.
 */
const MORE: Record<string, [string, boolean | null, string?][]> = {
  mass: [["pondus mass XxQq 'H2O' 'C6H12O6.H2O'", null], ['pondus mass --uncertainty Tc', true], ["pondus mass 'CaSO4·0.5H2O' C6D6 '[2H]2O' 'Pd(PPh3)4'", false], ['pondus mass -', null, 'H2O\nCo2\nAcOH\nNH4+\n\nMe3SiCl\n']],
  composition: [["pondus composition 'H2Q'", true], ["pondus composition --mixture 'C=7.34 g, Q=1 g'", true], ["pondus composition --mixture 'NaCl=5.00 g, KCl=3.00 g'", false], ["pondus composition --mixture 'C=7.34 g, H=1.85 g, total=12.50 g'", false], ["pondus composition --part H2O 'CaSO4·0.5H2O'", false]],
  calc: [["pondus calc '5 g + 3 mL'", true], ['pondus calc -', null, '1/0\n2 g * 3\n10.0 g - 9.95 g\n1300 g * 2\n'], ["pondus calc '8.80 ± 0.05 g + 2.10 ± 0.05 g'", false], ["pondus calc --explain --rounding half-up 'M(H2O) * 2'", false]],
  analysis: [['pondus analysis H2Q --found C=1', true], ['pondus analysis --sheet examples/ea-lab-sheet.csv', false], [`pondus analysis --sheet ${eaSheet}`, null]],
  empirical: [['pondus empirical C=abc', true], ["pondus empirical 'C=40.0 H=6.7 O=53.3' --tolerance 1", false], [`pondus empirical --sheet ${measSheet}`, null]],
  combustion: [["pondus combustion 'x g' --co2 '1.499 g' --h2o '0.4091 g'", true]],
  candidates: [['pondus candidates abc --ppm 3', true], ["pondus candidates 242.1172 --ion '[M+H]+' --ppm 3", false], ['pondus candidates 180.16 --molar-mass', false]],
  balance: [["pondus balance 'H2 -> O2'", true]],
  react: [["pondus react 'H2 + O2 -> H2O' --amount 'Q2=4.00 g'", true], ["pondus react 'H2 + O2 -> H2O' --amount 'H2=4.00 g' --amount 'O2=16.0 g' --actual 'H2O=15.0 g'", false], ["pondus react - --amount 'H2=4.00 g'", null, 'H2 + O2 -> H2O\nH2 + Q -> H2Q\n']],
  reagents: [["pondus reagents --reference 'Qq=2.00 g' --product C9H8O4", true], ['pondus reagents --procedure examples/organolithium-coupling.csv', false]],
  prepare: [
    ["pondus prepare Qq --concentration '0.100 M' --volume '250.0 mL'", true],
    ["pondus prepare NaCl --concentration '0.100 M' --volume '250.0 mL' --weighed '1.4587 g'", false],
    ["pondus prepare HCl --fraction '37 %' --density '1.19 g/mL' --concentration '1.00 M' --volume '500.0 mL'", false],
    ["pondus prepare 'CuSO4·5H2O' --replace 'CuSO4=10.00 g'", false],
    ['pondus prepare --sheet examples/prep-sheet.csv', false],
    [`pondus prepare --sheet ${prepSheet}`, null],
  ],
  dilute: [
    ["pondus dilute abc --to '0.100 M' --volume '250.0 mL'", true],
    ["pondus dilute '1:1000' --series --volume '10.00 mL'", false],
    ["pondus dilute '1.00 M' --to '1.00 mM' --series --volume '10.00 mL'", false],
    ["pondus dilute '10 % w/w' --to '2.5 % w/w' --mass '60.0 g'", false],
    ["pondus dilute - --to '2.5 mg/g' --mass '60.0 g'", null, '10 % w/w\nabc\n5 mg/g\n'],
  ],
  gravimetric: [['pondus gravimetric Qq --weighed Fe2O3', true]],
  basis: [['pondus basis Qq --to P', true]],
  salt: [["pondus salt Qq --parent C17H19NO3", true], ['pondus salt C7H5NaO2 --parent C7H6O2', false], ["pondus salt 'C17H19NO3·HCl·3H2O' --parent C17H19NO3 --salt-mass '12.0 mg'", false]],
  titration: [
    ["pondus titration KHC8H4O4 --sample '0.5000 g' --titrant '0.1000 M' --volume '24.40 mL' --on dried --loss '0.5 %'", false],
    ["pondus titration C9H8O4 --sample '1.000 g' --titrant '0.5000 M' --volume '20.00 mL' --added '50.00 mL of 0.5000 M' --ratio 1:2", false],
    ["pondus titration Qq --sample '0.5000 g' --titrant '0.1000 M' --volume '24.40 mL'", true],
    ["pondus titration KHC8H4O4 --sample '0.5000 g' --titrant '0.1000 M' --volume '24.40 mL' --limits 98.0-102.0", false],
  ],
  standardise: [["pondus standardise Qq --mass '0.5105 g' --volume '24.95 mL'", true]],
  'sample-basis': [["pondus sample-basis abc --to dried --loss '0.50 %'", true], ["pondus sample-basis '99.1 %' --to dried --loss '0.50 %' --limits 98.0-102.0", false]],
  replicates: [["pondus replicates '1.0 g'", true]],
  meq: [["pondus meq Qq --meq '20 mEq'", true], ["pondus meq KCl --mass '1.00 g'", false]],
  osmolarity: [["pondus osmolarity 'Qq=0.9 %'", true]],
  alligation: [["pondus alligation '30 %' --higher '20 %' --lower '5 %' --total '300 g'", true]],
  potency: [["pondus potency abc --need '500. mg'", true]],
  strength: [['pondus strength abc', true]],
  ion: [["pondus ion Qq --adduct '[M+H]+'", true], ["pondus ion C6H12O6 --adduct 'M+•'", false], [`pondus ion --sheet ${ionSheet}`, null], ['pondus ion -', null, 'C6H12O6 [M+Na]+ 203.0526\nC6H12O6 [M+H]+\nQq [M+H]+\n']],
  pattern: [['pondus pattern Qq', true], ["pondus pattern --adduct '[M+H]+' C6H12O6", false], ['pondus pattern --resolution 50000 C6H12O6', false], ['pondus pattern --fine C2H6', false]],
};

/** The argument list of a command line, with --json (in place of a table or markdown format). */
function jsonArgs(line: string): string[] {
  const words = shellWords(line).slice(1).filter((w) => w !== '--markdown').map((w) => (w.startsWith('examples/') ? ROOT + w : w));
  if (!words.includes('--json')) words.splice(1, 0, '--json');
  return words;
}

function runRows(line: string, stdin?: string) {
  const r = pondus(jsonArgs(line), stdin);
  const rows = r.stdout.trim() === '' ? [] : r.stdout.trim().split('\n').map((l) => JSON.parse(l) as Record<string, unknown>);
  return { ...r, rows };
}

describe('every command has a JSON schema', () => {
  it('the list of commands is read from the help', () => {
    expect(commandNames.length).toBeGreaterThanOrEqual(25);
  });
  it('each command in the help and each registered presenter has schemas/<command>.schema.json', () => {
    const files = new Set(readdirSync(SCHEMAS));
    const missing = [...new Set([...commandNames, ...Object.keys(PRESENTERS)])].filter((c) => !files.has(`${c}.schema.json`));
    expect(missing).toEqual([]);
  });
  it('no schema for a command that does not exist', () => {
    const extra = readdirSync(SCHEMAS).filter((f) => f !== 'common.schema.json').map((f) => f.replace(/\.schema\.json$/, '')).filter((c) => !commandNames.includes(c));
    expect(extra).toEqual([]);
  });
  it('each schema compiles under draft 2020-12 in strict mode', () => {
    for (const c of commandNames) expect(() => validatorOf(c), c).not.toThrow();
  });
  it('the schemas ship with the package', () => {
    const pkg = JSON.parse(readFileSync(`${ROOT}package.json`, 'utf8')) as { files: string[] };
    expect(pkg.files).toContain('schemas');
  });
  it('every command has inputs to check here, a failing one among them', () => {
    for (const c of commandNames) {
      expect(HELP_EXAMPLES[c]?.length, c).toBeGreaterThan(0);
      expect(MORE[c]?.some(([, err]) => err !== false), c).toBe(true);
    }
  });
});

describe('the schemas reject rows that break the contract', () => {
  const good = { line: 1, input: 'H2O', formula: 'H2O', molarMass: 18.015, monoisotopicMass: 18.010564683056, nominalMass: 18, charge: 0, notes: [] };
  const v = () => validatorOf('mass');
  it('accepts a good row and an error row', () => {
    expect(v()(good)).toBe(true);
    const qq = { code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Qq'", column: 1 };
    expect(v()({ line: 2, input: 'Qq', error: qq, errors: [qq], notes: [] })).toBe(true);
  });
  it('requires the notes of an error row, as of every row', () => {
    const qq = { code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Qq'", column: 1 };
    expect(v()({ line: 2, input: 'Qq', error: qq, errors: [qq] })).toBe(false);
    expect(v()({ line: 2, input: 'Qq.H2O', error: qq, errors: [qq], notes: [{ code: 'DOT_AS_ADDITION', message: 'read as the addition dot' }] })).toBe(true);
  });
  it('requires every issue of an error row in errors', () => {
    const qq = { code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Qq'", column: 1 };
    expect(v()({ line: 2, input: 'Qq', error: qq, notes: [] })).toBe(false);
    expect(v()({ line: 2, input: 'Qq', error: qq, errors: [], notes: [] })).toBe(false);
  });
  it.each([
    ['notes missing', { ...good, notes: undefined }],
    ['notes as strings', { ...good, notes: ['read as cobalt'] }],
    ['a note without its code', { ...good, notes: [{ message: 'read as cobalt' }] }],
    ['input missing', { ...good, input: undefined }],
    ['line missing', { ...good, line: undefined }],
    ['line 0', { ...good, line: 0 }],
    ['a null where a number belongs', { ...good, molarMass: null }],
    ['an error row without a code', { line: 1, input: 'Qq', error: { message: 'unknown', column: 1 } }],
  ])('refuses %s', (_, row) => {
    expect(v()(JSON.parse(JSON.stringify(row)))).toBe(false);
  });
});

describe.each(commandNames)('%s --json rows validate against the command schema', (command) => {
  const cases: [string, boolean | null, string?][] = [...(HELP_EXAMPLES[command] ?? []).map((e): [string, boolean | null] => [e, false]), ...(MORE[command] ?? [])];
  it.each(cases)('%s', (line, errors, stdin) => {
    const { status, rows, stderr } = runRows(line, stdin);
    expect(status, stderr).toBe(errors === true ? 1 : errors === false ? 0 : 1);
    expect(rows.length).toBeGreaterThan(0);
    const validate = validatorOf(command);
    rows.forEach((row, i) => {
      const ok = validate(row);
      expect(ok ? [] : validate.errors, `row ${i + 1}: ${JSON.stringify(row).slice(0, 300)}`).toEqual([]);
      // one row per input, in order: argument i is line i; a sheet row keeps its line in the file
      if (i > 0) expect(row.line as number).toBeGreaterThan(rows[i - 1].line as number);
      if (!/--(sheet|procedure)/.test(line)) expect(row.line).toBe(i + 1);
      if (errors === true) expect(row).toHaveProperty('error');
      if (errors === false) expect(row).not.toHaveProperty('error');
    });
    if (errors === null) {
      expect(rows.some((r) => 'error' in r)).toBe(true);
      expect(rows.some((r) => !('error' in r))).toBe(true);
    }
  });
});
