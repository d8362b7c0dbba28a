import type { Command } from 'commander';
import { react, type ReactOptions, type ReactResult } from '../../reactions/react.js';
import { reactJson } from '../../reactions/react-json.js';
import { readFixOption } from '../../reactions/fix-option.js';
import { BENCH_CAUTION } from '../../preparation/caution.js';
import { fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { fail } from '../../errors/pondus-error.js';
import { readKeyValuePair } from '../../key-values/read-key-values.js';
import { roundingOf, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { declareReact } from './declarations.js';

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
      for (const l of r.reactants) {
        if (!l.take) continue;
        const what = [l.take.volume?.display, l.take.mass?.display].filter((x) => x).join(' (') + (l.take.volume && l.take.mass ? ')' : '');
        lines.push(`take ${l.species}: ${what} of ${l.take.of}`);
      }
      lines.push(`limiting reagent: ${r.limiting}`);
      for (const e of r.excess) lines.push(`left over: ${e.species} ${e.moles.figure} mol${e.mass ? ` (${e.mass.figure} g)` : ''}`);
      if (r.percentYield) lines.push(`percent yield of ${r.percentYield.species}: ${r.percentYield.percent.figure} %`);
      return lines.join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => r.notes,
    caution: BENCH_CAUTION,
  };
}


/** Registers `pondus react`. */
export function registerReact(program: Command, run: CommandRunner): void {
  declareReact(program).action((inputs: string[], o: ReactCliOptions) => run('react', inputs, o));
}
