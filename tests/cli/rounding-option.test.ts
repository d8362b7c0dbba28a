import { describe, expect, it } from 'vitest';
import { pondus } from './run-cli.js';

// Every command that rounds a reported value takes --rounding half-even|half-up (a pharmacopoeia or
// house rule may ask for half up); a value outside the two is a usage error.
const commands: [string, string[]][] = [
  ['mass', ['mass', 'H2O']],
  ['composition', ['composition', 'H2O']],
  ['calc', ['calc', '2.45 g * 1.0']],
  ['analysis', ['analysis', 'C6H6', '--found', 'C=92.20,H=7.70']],
  ['combustion', ['combustion', '1.000 g', '--co2', '1.499 g', '--h2o', '0.4091 g']],
  ['react', ['react', 'H2 + O2 -> H2O', '--amount', 'H2=2.00 g']],
  ['prepare', ['prepare', 'NaCl', '--concentration', '0.100 M', '--volume', '250.0 mL']],
  ['dilute', ['dilute', '1.00 M', '--to', '0.100 M', '--volume', '250.0 mL']],
  ['gravimetric', ['gravimetric', 'Cl', '--weighed', 'AgCl', '--mass', '0.2866 g']],
  ['basis', ['basis', 'P2O5', '--to', 'P', '--value', '12.5 %']],
  ['salt', ['salt', 'C17H19NO3·HCl·3H2O', '--parent', 'C17H19NO3', '--dose', '10.0 mg']],
  ['titration', ['titration', 'C9H8O4', '--sample', '0.4985 g', '--titrant', '0.1002 M', '--volume', '27.45 mL']],
  ['replicates', ['replicates', '99.42 99.61 99.38 %']],
  ['meq', ['meq', 'KCl', '--mass', '1.000 g']],
];

describe('--rounding on every command that rounds', () => {
  it.each(commands)('%s takes half-up and refuses anything else', (_name, args) => {
    const ok = pondus([...args, '--rounding', 'half-up']);
    expect(ok.status, ok.stderr).toBe(0);
    const bad = pondus([...args, '--rounding', 'up']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/rounding/);
  });

  it('half-up and half-even differ on an exact tie', () => {
    // 2.45 g × 1.0 = 2.45 g, to 2 figures: 2.4 g half-even (ASTM E29), 2.5 g half-up
    expect(pondus(['calc', '2.45 g * 1.0']).stdout).toContain('2.4 g');
    expect(pondus(['calc', '2.45 g * 1.0', '--rounding', 'half-up']).stdout).toContain('2.5 g');
  });
});
