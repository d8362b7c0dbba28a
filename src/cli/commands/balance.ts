import type { Command } from 'commander';
import { balance, balanceJson, type BalanceResult } from '../../reactions/balance.js';
import type { Presenter } from '../output/presenter.js';
import { withOutputOptions, type OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';

interface BalanceCliOptions extends OutputOptions {
  abbreviations?: boolean;
}

/** The presenter for `pondus balance`. */
export function balancePresenter(o: BalanceCliOptions): Presenter<BalanceResult> {
  return {
    compute: (input) => balance(input, { abbreviations: !!o.abbreviations }),
    json: balanceJson,
    columns: ['input', 'balanced', 'species', 'coefficients'],
    cells: (r) => [r.input, r.balanced, r.species.join(' '), r.coefficients.join(' ')],
    table: { head: ['equation', 'balanced'], row: (r) => [r.input, r.balanced] },
    notes: (r) => r.notes.map((n) => n.message),
    noteItems: (r) => r.notes,
  };
}

/** Registers `pondus balance`. */
export function registerBalance(program: Command, run: CommandRunner): void {
  withOutputOptions(
    program
      .command('balance')
      .description('balance chemical equations exactly (ions and electrons included)')
      .argument('[equations...]', "equations such as 'Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O'; - reads one per line")
      .option('--abbreviations', 'also read the abbreviations that need the reading settled: Ac (acetyl, OAc), Pr (propyl), Ts (tosyl) and reagent names such as THF, COD, TBS (Me, Et, Ph, Boc, Cp*, py and the like are read by default)'),
  ).action((inputs: string[], o: BalanceCliOptions) => run('balance', inputs, o));
}
