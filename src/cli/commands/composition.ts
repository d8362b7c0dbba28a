import type { Command } from 'commander';
import { composition, type CompositionResult } from '../../composition/element-shares.js';
import { mixtureComposition, mixtureJson, type MixtureResult } from '../../composition/mixture.js';
import { displayMeasured } from '../../sigfig/round.js';
import { compositionJson } from '../../composition/composition-json.js';
import { amountText } from '../../formula/amount.js';
import { displayContribution, displayMolarMass, displayPercent, fixedTable } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { fail } from '../../errors/pondus-error.js';
import { joinPairArgs, takeJoinedNote } from '../input/key-value-args.js';
import { withFormulaOptions, withRoundingOption, type FormulaOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';

interface CompositionCliOptions extends FormulaOptions, RoundingOptions {
  part?: string;
  mixture?: boolean;
  /** Inputs joined from single formula=mass arguments, with the note saying so (set by the command). */
  joined?: Record<string, string>;
}

/** The presenter for `pondus composition --mixture`: inputs are `formula=mass` lists. */
export function mixturePresenter(o: CompositionCliOptions): Presenter<MixtureResult> {
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations };
  const rounding = o.rounding ?? 'half-even';
  const list = (shares: MixtureResult['components']) => shares.map((s) => `${s.name}=${displayMeasured(s.massPercent, rounding).text}`).join(' ');
  return {
    compute: (input) => {
      const r = mixtureComposition(input, opts);
      const joined = takeJoinedNote(o.joined, input);
      if (joined) r.notes.unshift({ code: 'JOINED_ARGUMENTS', message: joined });
      return r;
    },
    json: (r) => mixtureJson(r, rounding),
    columns: ['input', 'totalMass', 'byComponent', 'byElement'],
    cells: (r) => [r.input, r.total.value.toFixed(), list(r.components), list(r.elements)],
    notes: (r) => r.notes.map((n) => n.message),
    noteItems: (r) => r.notes,
    block: (r) => {
      const rows = (shares: MixtureResult['components']) => shares.map((s) => [s.name, displayMeasured(s.mass, rounding).text, displayMeasured(s.massPercent, rounding).text]);
      return [
        `${r.input}   total ${displayMeasured(r.total, rounding).text} g`,
        fixedTable(['component', 'mass g', 'mass %'], rows(r.unaccounted ? [...r.components, r.unaccounted] : r.components), ['left', 'right', 'right']),
        fixedTable(['element', 'mass g', 'mass %'], rows(r.elements), ['left', 'right', 'right']),
      ].join('\n');
    },
  };
}

/** The presenter for `pondus composition`. */
export function compositionPresenter(o: CompositionCliOptions): Presenter<CompositionResult> | Presenter<MixtureResult> {
  if (o.mixture && o.part !== undefined) throw fail({ code: 'USAGE', message: '--part gives the share of a fragment in one formula; with --mixture the inputs are measured masses: drop one' });
  return o.mixture ? mixturePresenter(o) : formulaPresenter(o);
}

function formulaPresenter(o: CompositionCliOptions): Presenter<CompositionResult> {
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations, part: o.part };
  const rounding = o.rounding ?? 'half-even';
  const columns = ['input', 'formula', 'molarMass', 'massPercent'];
  if (o.part !== undefined) columns.push('part', 'partCount', 'partMassPercent');
  return {
    compute: (input) => composition(input, opts),
    json: compositionJson,
    columns,
    cells: (r) => {
      const cells = [r.input, r.formula, r.molarMass.toFixed(), r.elements.map((e) => `${e.symbol}=${e.massPercent.toDecimalPlaces(6).toFixed()}`).join(' ')];
      if (r.part) cells.push(r.part.part, amountText(r.part.count), r.part.massPercent.toDecimalPlaces(6).toFixed());
      return cells;
    },
    block: (r) => {
      const rows = r.elements.map((e, i) => [e.symbol, amountText(e.count), displayContribution(r.mass.contributions[i]), displayPercent(e.massPercent, rounding)]);
      const lines = [`${r.input}  →  ${r.formula}   M = ${displayMolarMass(r.mass, rounding)} g/mol`];
      lines.push(fixedTable(['element', 'count', 'mass g/mol', 'mass %'], rows, ['left', 'right', 'right', 'right']));
      if (r.part) {
        lines.push(`${r.part.part}: ${amountText(r.part.count)} × ${r.part.unitMass.toFixed()} g/mol = ${r.part.mass.toFixed()} g/mol, ${displayPercent(r.part.massPercent, rounding)} % by mass`);
      }
      return lines.join('\n');
    },
    notes: (r) => r.notes.map((n) => n.message),
    noteItems: (r) => r.notes,
  };
}

/** Registers `pondus composition`. */
export function registerComposition(program: Command, run: CommandRunner): void {
  withRoundingOption(withFormulaOptions(
    program
      .command('composition')
      .description('percent by mass of each element, and of a fragment with --part')
      .argument('[formulas...]', 'formulas; - reads one per line from standard input')
      .option('--part <fragment>', 'also the mass fraction of a fragment: H2O in a hydrate, SO4 in a salt, Fe in an iron salt')
      .option('--mixture', "inputs are measured masses, 'NaCl=5.00 g, KCl=3.00 g' or 'C=7.34 g H=1.85 g N=2.85 g' (unquoted NaCl=5.00 g KCl=3.00 g is one mixture): percent by component and by element"),
  )).action((formulas: string[], o: CompositionCliOptions) => {
    if (!o.mixture) return run('composition', formulas, o);
    const { inputs, joined } = joinPairArgs(formulas, { what: 'mixture', units: true });
    const options: CompositionCliOptions = { ...o, joined };
    return run('composition', inputs, options);
  });
}
