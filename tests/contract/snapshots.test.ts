// Snapshot tests of what each command prints: its --help, its first help example as a table, as
// JSON Lines and as CSV, and the rendering of typical errors. A change to any of them shows up as
// a snapshot diff to review (update with `npx vitest run tests/contract/snapshots.test.ts -u`).
import { describe, expect, it } from 'vitest';
import { HELP_EXAMPLES } from '../../src/cli/help-examples.js';
import { pondus } from '../cli/run-cli.js';
import { shellWords } from '../support/command-lines.js';

const NO_ROWS = new Set(['completion', 'manual']);
const FORMAT = /^--(json|csv|tsv|markdown|svg)$/;
const shown = (args: string[]) => {
  const r = pondus(args);
  return `$ pondus ${args.join(' ')}\nexit ${r.status}\n--- stdout\n${r.stdout}--- stderr\n${r.stderr}`;
};

describe('snapshots of every command', () => {
  for (const [command, examples] of Object.entries(HELP_EXAMPLES)) {
    it(`${command} --help`, () => {
      expect(shown([command, '--help'])).toMatchSnapshot();
    });
    if (NO_ROWS.has(command)) continue;
    const args = shellWords(examples[0]).slice(1);
    it(`${command}: its first example as a table, JSON and CSV`, () => {
      expect(shown(args)).toMatchSnapshot();
      if (!args.some((a) => FORMAT.test(a))) {
        expect(shown([...args, '--json'])).toMatchSnapshot();
        expect(shown([...args, '--csv'])).toMatchSnapshot();
      }
    });
  }
});

describe('snapshots of error rendering', () => {
  const cases: string[][] = [
    ['mass', 'Ca(OH2'],
    ['mass', 'XxQq'],
    ['mass', 'AcOH'],
    ['mass', 'co2'],
    ['mass', '--json', 'H2O', 'Ca(OH2'],
    ['calc', '5 g + 2 mL'],
    ['balance', 'H2 + O2'],
    ['empirical', 'C=40.00 Q=6.71'],
    ['prepare', 'HCl', '--concentration', '1.00 M', '--volume', '500.0 mL'],
    ['mass', 'H2O', '--frobnicate'],
  ];
  for (const args of cases) {
    it(args.join(' '), () => {
      expect(shown(args)).toMatchSnapshot();
    });
  }
});
