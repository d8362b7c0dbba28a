import type { Command } from 'commander';
import { balance, type BalanceOptions, type BalanceResult } from '../../reactions/balance.js';
import { balanceJson } from '../../reactions/balance-json.js';
import { readFixOption } from '../../reactions/fix-option.js';
import type { Presenter } from '../output/presenter.js';
import { withOutputOptions, type OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';

interface BalanceCliOptions extends OutputOptions {
  abbreviations?: boolean;
  fix?: string[];
  catalyst?: string[];
}

/** The presenter for `pondus balance`. */
export function balancePresenter(o: BalanceCliOptions): Presenter<BalanceResult> {
  const opts: BalanceOptions = { abbreviations: !!o.abbreviations };
  if (o.fix && o.fix.length) opts.fix = readFixOption(o.fix);
  if (o.catalyst && o.catalyst.length) opts.catalysts = o.catalyst;
  return {
    compute: (input) => balance(input, opts),
    json: balanceJson,
    columns: ['input', 'balanced', 'balancedAsWritten', 'unique', 'independentBalances', 'settledBy'],
    cells: (r) => [r.input, r.balanced, String(r.balancedAsWritten), String(r.unique), r.independentBalances, r.settledBy],
    table: { head: ['equation', 'balanced'], row: (r) => [r.input, r.balanced] },
    notes: (r) => r.notes.map((n) => n.message),
    noteItems: (r) => r.notes,
  };
}

const collect = (v: string, prev: string[] = []) => [...prev, v];

/** Registers `pondus balance`. */
export function registerBalance(program: Command, run: CommandRunner): void {
  withOutputOptions(
    program
      .command('balance')
      .description('balance chemical equations exactly (ions and electrons included); coefficients as written are used when they balance')
      .argument('[equations...]', "equations such as 'Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O'; - reads one per line")
      .option('--fix <coefficients>', "when atoms alone allow more than one balance: 'written' (the coefficients written in the equation) or SPECIES=N ('C4H6O3=5'; repeat or separate by commas)", collect)
      .option('--catalyst <species>', "a species written on one side that is a catalyst or additive, left out of the balance: 'H2SO4' (repeat for each; one written on both sides is read so by itself)", collect)
      .option('--abbreviations', 'also read the abbreviations that need the reading settled: Ac (acetyl, OAc), Pr (propyl), Ts (tosyl) and reagent names such as THF, COD, TBS (Me, Et, Ph, Boc, Cp*, py and the like are read by default)'),
  ).action((inputs: string[], o: BalanceCliOptions) => run('balance', inputs, o));
}
