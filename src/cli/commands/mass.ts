import type { Command } from 'commander';
import { formulaMass, type MassResult } from '../../mass/formula-mass.js';
import { massJson, massJsonLine } from '../../mass/mass-json.js';
import { chargeLabel, displayMolarMass, displayMonoisotopic } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { withFormulaOptions, type FormulaOptions } from './common.js';
import type { CommandRunner } from './runner.js';

/** The presenter for `pondus mass`. */
export function massPresenter(o: FormulaOptions): Presenter<MassResult> {
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations };
  return {
    compute: (input) => formulaMass(input, opts),
    json: massJson,
    jsonLine: massJsonLine,
    columns: ['input', 'formula', 'molarMass', 'monoisotopicMass', 'nominalMass', 'charge'],
    cells: (r) => [r.input, r.formula, r.molarMass.toFixed(), r.monoisotopicMass.toFixed(), r.nominalMass, r.charge],
    table: {
      head: ['input', 'formula (Hill)', 'molar mass g/mol', 'monoisotopic u', 'nominal', 'charge'],
      align: ['left', 'left', 'right', 'right', 'right', 'right'],
      row: (r) => [r.input, r.formula, displayMolarMass(r), displayMonoisotopic(r), r.nominalMass ?? '—', chargeLabel(r.charge)],
    },
    notes: (r) => r.notes.map((n) => n.message),
  };
}

/** Registers `pondus mass`. */
export function registerMass(program: Command, run: CommandRunner): void {
  withFormulaOptions(
    program
      .command('mass')
      .description('molar mass, monoisotopic mass and nominal mass of formulas')
      .argument('[formulas...]', 'formulas; - reads one per line from standard input'),
  ).action((formulas: string[], o: FormulaOptions) => run('mass', formulas, o));
}
