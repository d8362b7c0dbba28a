import type { Command } from 'commander';
import { react, type ReactOptions, type ReactResult } from '../../reactions/react.js';
import { reactJson } from '../../reactions/react-json.js';
import { readFixOption } from '../../reactions/fix-option.js';
import { BENCH_CAUTION } from '../../preparation/caution.js';
import { fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { fail } from '../../errors/pondus-error.js';
import { readKeyValuePair } from '../../key-values/read-key-values.js';
import { roundingOf, withOutputOptions, withRoundingOption, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';

interface ReactCliOptions extends OutputOptions, RoundingOptions {
  amount?: string[];
  actual?: string;
  fix?: string[];
  catalyst?: string[];
  abbreviations?: boolean;
}

/** The presenter for `pondus react`. */
export function reactPresenter(o: ReactCliOptions): Presenter<ReactResult> {
  if (!o.amount || o.amount.length === 0) throw fail({ code: 'USAGE', message: "give the amount of at least one reactant: --amount 'H2=4.00 g' (repeat for each)" });
  const keys = o.amount.map((a) => readKeyValuePair(a)?.key ?? '');
  const twice = keys.find((k, i) => k !== '' && keys.indexOf(k) !== i);
  if (twice !== undefined) throw fail({ code: 'USAGE', message: `--amount gives ${twice} twice: give one amount per reactant` });
  const opts: ReactOptions = { amounts: o.amount, actual: o.actual, abbreviations: !!o.abbreviations, rounding: roundingOf(o) };
  if (o.fix && o.fix.length) opts.fix = readFixOption(o.fix);
  if (o.catalyst && o.catalyst.length) opts.catalysts = o.catalyst;
  const fig = (a: { figure: string } | null) => (a ? a.figure : '');
  return {
    compute: (input) => react(input, opts),
    json: reactJson,
    // one row per equation, flat: the first product written is the one the yield is of
    columns: ['input', 'balanced', 'limiting', 'product', 'theoretical_mol', 'theoretical_g', 'percentYield'],
    cells: (r) => [r.input, r.balanced, r.limiting, r.products[0].species, fig(r.products[0].moles), fig(r.products[0].mass), r.percentYield ? r.percentYield.percent.figure : ''],
    block: (r) => {
      const row = (l: ReactResult['reactants'][number], role: string) => [l.species, l.exactCoefficient, role, fig(l.moles), fig(l.mass)];
      const lines = [r.balanced];
      lines.push(
        fixedTable(
          ['species', 'coefficient', '', 'amount mol', 'mass g'],
          [
            ...r.reactants.map((l) => row(l, l.species === r.limiting ? 'limiting' : l.moles ? 'given' : 'in excess')),
            ...r.catalysts.map((c) => [c.species, '', 'catalyst', fig(c.moles), fig(c.mass)]),
            ...r.products.map((l) => row(l, 'theoretical yield')),
          ],
          ['left', 'right', 'left', 'right', 'right'],
        ),
      );
      lines.push(`limiting reagent: ${r.limiting}`);
      for (const e of r.excess) lines.push(`left over: ${e.species} ${e.moles.figure} mol${e.mass ? ` (${e.mass.figure} g)` : ''}`);
      if (r.percentYield) lines.push(`percent yield of ${r.percentYield.species}: ${r.percentYield.percent.figure} %`);
      return lines.join('\n');
    },
    notes: (r) => r.notes.map((n) => n.message),
    noteItems: (r) => r.notes,
    caution: BENCH_CAUTION,
  };
}

const collect = (v: string, prev: string[] = []) => [...prev, v];

/** Registers `pondus react`. */
export function registerReact(program: Command, run: CommandRunner): void {
  const cmd = withRoundingOption(withOutputOptions(
    program
      .command('react')
      .description('limiting reagent, theoretical yield, excess left and percent yield of a reaction')
      .argument('[equations...]', 'equations (coefficients as written are used when they balance; balanced here if not); - reads one per line')
      .option('--amount <species=amount>', "an amount of a reactant: 'H2=4.00 g', 'O2=0.500 mol', 'HCl=25.0 mL of 0.100 M', 'Ac2O=2.00 mL, density=1.08 g/mL', 'Ac2O=1.5 equiv' (of the first reactant given by its own amount); purity= and solution= as in a reagent table (repeat for each)", collect)
      .option('--actual <species=amount>', "the amount of a product obtained, for percent yield: 'H2O=30.1 g'")
      .option('--fix <coefficients>', "when atoms alone allow more than one balance: 'written' or SPECIES=N ('C4H6O3=5')", collect)
      .option('--catalyst <species>', "a species written on one side that is a catalyst, left out of the balance: 'H2SO4' (its amount, if given with --amount, may be in mol %)", collect)
      .option('--abbreviations', 'also read the abbreviations that need the reading settled: Ac (acetyl, OAc), Pr (propyl), Ts (tosyl) and reagent names such as THF, COD, TBS (Me, Et, Ph, Boc, Cp*, py and the like are read by default)'),
  ));
  cmd.action((inputs: string[], o: ReactCliOptions) => run('react', inputs, o));
}
