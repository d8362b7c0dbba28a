// A command's own bundle declares only the command it runs, not its module's other commands; the
// whole program (help, completion, the manual) declares every one.
import { describe, expect, it } from 'vitest';
import { Command } from 'commander';
import { declareConversions, declareEmpirical, declareIon, declarePharmacy, declareQc } from '../../../src/cli/commands/declarations.js';

const names = (declare: (p: Command, only?: string) => unknown, only?: string) => {
  const program = new Command();
  declare(program, only);
  return program.commands.map((c) => c.name());
};

describe('declaring one command of a module', () => {
  it('declares only the command asked for', () => {
    expect(names(declareEmpirical, 'combustion')).toEqual(['combustion']);
    expect(names(declareConversions, 'salt')).toEqual(['salt']);
    expect(names(declareQc, 'sample-basis')).toEqual(['sample-basis']);
    expect(names(declarePharmacy, 'osmolarity')).toEqual(['osmolarity']);
    expect(names(declareIon, 'pattern')).toEqual(['pattern']);
  });

  it('declares every command, in order, when none or another module\'s is asked for', () => {
    expect(names(declareEmpirical)).toEqual(['empirical', 'combustion', 'candidates']);
    expect(names(declareQc, 'mass')).toEqual(['titration', 'standardise', 'sample-basis', 'replicates']);
  });

  it('keeps the rules of the command declared alone', () => {
    const program = new Command();
    const c = declareConversions(program, 'salt');
    expect(c.salt?.options.map((o) => o.long)).toContain('--parent');
    expect(c.dilute).toBeUndefined();
  });
});
