import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

// A reading taken while parsing a formula (here the '.' of CaSO4.0.5H2O read as the addition dot,
// 145.14 g/mol rather than CaSO4·5H2O's 226.21) must reach the result of every command that
// computes with the formula: in the table, in JSON and in CSV.
const DOT = /'\.' at column \d+ is read as the addition dot: CaSO4·0\.5H2O/;

const commands: [string, string[]][] = [
  ['mass', ['mass', 'CaSO4.0.5H2O']],
  ['composition', ['composition', 'CaSO4.0.5H2O']],
  ['composition --part', ['composition', '--part', 'H2O', 'CaSO4.0.5H2O']],
  ['prepare', ['prepare', 'CaSO4.0.5H2O', '--concentration', '0.100 M', '--volume', '100.0 mL']],
  ['prepare --replace', ['prepare', 'CaSO4', '--replace', 'CaSO4.0.5H2O=1.000 g']],
  ['gravimetric', ['gravimetric', 'Ca', '--weighed', 'CaSO4.0.5H2O', '--mass', '1.000 g']],
  ['basis', ['basis', 'CaSO4.0.5H2O', '--to', 'Ca', '--value', '10.0 %']],
  ['salt', ['salt', 'CaSO4.0.5H2O', '--parent', 'CaSO4', '--dose', '10.0 mg']],
  ['react', ['react', 'CaSO4.0.5H2O -> CaSO4 + H2O', '--amount', 'CaSO4.0.5H2O=1.00 g']],
  ['analysis', ['analysis', 'CaSO4.0.5H2O', '--found', 'Ca=27.6']],
];

describe('a formula reading reaches every result', () => {
  it.each(commands)('%s: table, JSON and CSV', (_name, args) => {
    const table = pondus(args);
    expect(table.status, table.stderr).toBe(0);
    expect(table.stdout + table.stderr).toMatch(DOT);
    const json = pondus([...args, '--json']);
    const row = jsonLines(json.stdout)[0];
    const notes = (row.notes as (string | { message: string })[]).map((n) => (typeof n === 'string' ? n : n.message));
    expect(notes.some((n) => DOT.test(n)), JSON.stringify(row.notes)).toBe(true);
    const csv = pondus([...args, '--csv']);
    expect(csv.stdout).toMatch(DOT);
  });
});
