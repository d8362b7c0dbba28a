import type { Command } from 'commander';
import { balance, type BalanceOptions, type BalanceResult } from '../../reactions/balance.js';
import { balanceJson } from '../../reactions/balance-json.js';
import { readFixOption } from '../../reactions/fix-option.js';
import type { Presenter } from '../output/presenter.js';
import type { OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { declareBalance } from './declarations.js';

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
    notes: (r) => r.notes,
    noteItems: (r) => r.notes,
  };
}


/** Registers `pondus balance`. */
export function registerBalance(program: Command, run: CommandRunner): void {
  declareBalance(program).action((inputs: string[], o: BalanceCliOptions) => run('balance', inputs, o));
}
