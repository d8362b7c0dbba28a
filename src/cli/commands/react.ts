import type { Command } from 'commander';
import { react, type ReactResult } from '../../reactions/react.js';
import { BENCH_CAUTION } from '../../preparation/caution.js';
import { displayQuantity } from '../../sigfig/display-quantity.js';
import type { Quantity } from '../../sigfig/quantity.js';
import { fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { fail } from '../../errors/pondus-error.js';
import type { RoundingMode } from '../../sigfig/round.js';
import { roundingOf, withOutputOptions, withRoundingOption, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';

interface ReactCliOptions extends OutputOptions, RoundingOptions {
  amount?: string[];
  actual?: string;
  abbreviations?: boolean;
}

function reactJson(r: ReactResult, rounding: RoundingMode) {
  const show = (q: Quantity | null, unit: string) => (q ? displayQuantity(q, unit, rounding).figure : '');
  const num = (q: Quantity | null, unit: string) => (q ? displayQuantity(q, unit, rounding).value.toNumber() : null);
  const line = (l: ReactResult['reactants'][number]) => ({
    species: l.species,
    coefficient: Number(l.coefficient),
    moles: num(l.moles, 'mol'),
    molesDisplay: show(l.moles, 'mol'),
    mass: num(l.mass, 'g'),
    massDisplay: show(l.mass, 'g'),
  });
  return {
    input: r.input,
    balanced: r.balanced,
    limiting: r.limiting,
    extent: num(r.extent, 'mol'),
    reactants: r.reactants.map(line),
    products: r.products.map(line),
    excess: r.excess.map((e) => ({ species: e.species, moles: num(e.moles, 'mol'), molesDisplay: show(e.moles, 'mol'), mass: num(e.mass, 'g'), massDisplay: show(e.mass, 'g') })),
    percentYield: r.percentYield ? { species: r.percentYield.species, percent: r.percentYield.percent.value.toNumber(), display: displayQuantity(r.percentYield.percent, undefined, rounding).figure } : null,
    notes: r.notes.map((n) => ({ code: n.code, message: n.message })),
  };
}

/** The presenter for `pondus react`. */
export function reactPresenter(o: ReactCliOptions): Presenter<ReactResult> {
  if (!o.amount || o.amount.length === 0) throw fail({ code: 'USAGE', message: "give the amount of at least one reactant: --amount 'H2=4.00 g' (repeat for each)" });
  const keys = o.amount.map((a) => a.slice(0, Math.max(0, a.indexOf('='))).trim());
  const twice = keys.find((k, i) => k !== '' && keys.indexOf(k) !== i);
  if (twice !== undefined) throw fail({ code: 'USAGE', message: `--amount gives ${twice} twice: give one amount per reactant` });
  const rounding = roundingOf(o);
  const show = (q: Quantity | null, unit: string) => (q ? displayQuantity(q, unit, rounding).figure : '');
  const opts = { amounts: o.amount, actual: o.actual, abbreviations: !!o.abbreviations };
  return {
    compute: (input) => react(input, opts),
    json: (r) => reactJson(r, rounding),
    columns: ['input', 'balanced', 'limiting', 'products', 'percentYield'],
    cells: (r) => [r.input, r.balanced, r.limiting, r.products.map((p) => `${p.species}=${show(p.mass, 'g')} g`).join(' '), r.percentYield ? displayQuantity(r.percentYield.percent, undefined, rounding).figure : ''],
    block: (r) => {
      const row = (l: ReactResult['reactants'][number], role: string) => [l.species, String(l.coefficient), role, show(l.moles, 'mol'), show(l.mass, 'g')];
      const lines = [r.balanced];
      lines.push(
        fixedTable(
          ['species', 'coefficient', '', 'amount mol', 'mass g'],
          [...r.reactants.map((l) => row(l, l.species === r.limiting ? 'limiting' : l.moles ? 'given' : 'in excess')), ...r.products.map((l) => row(l, 'theoretical yield'))],
          ['left', 'right', 'left', 'right', 'right'],
        ),
      );
      lines.push(`limiting reagent: ${r.limiting}`);
      for (const e of r.excess) lines.push(`left over: ${e.species} ${show(e.moles, 'mol')} mol${e.mass ? ` (${show(e.mass, 'g')} g)` : ''}`);
      if (r.percentYield) lines.push(`percent yield of ${r.percentYield.species}: ${displayQuantity(r.percentYield.percent, undefined, rounding).figure} %`);
      return lines.join('\n');
    },
    notes: (r) => r.notes.map((n) => n.message),
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
      .argument('[equations...]', 'equations (balanced here if they are not); - reads one per line')
      .option('--amount <species=amount>', "an amount of a reactant: 'H2=4.00 g', 'O2=0.500 mol', 'HCl=25.0 mL of 0.100 M' (repeat for each)", collect)
      .option('--actual <species=amount>', "the amount of a product obtained, for percent yield: 'H2O=30.1 g'")
      .option('--abbreviations', 'also read the abbreviations that need the reading settled: Ac (acetyl, OAc), Pr (propyl), Ts (tosyl) and reagent names such as THF, COD, TBS (Me, Et, Ph, Boc, Cp*, py and the like are read by default)'),
  ));
  cmd.action((inputs: string[], o: ReactCliOptions) => run('react', inputs, o));
}
