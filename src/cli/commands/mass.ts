import type { Command } from 'commander';
import { fail } from '../../errors/pondus-error.js';
import { formulaMass, formulaMassDetail, plainMass, type MassDetail } from '../../mass/formula-mass.js';
import { MASS_COLUMNS, massCells, massJson, massJsonLine, massUncertaintyJson, UNCERTAINTY_BASIS } from '../../mass/mass-json.js';
import { formatWithUncertainty, molarMassUncertainty, type MolarMassUncertainty } from '../../mass/uncertainty.js';
import { chargeLabel, displayMolarMass, displayMonoisotopic } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { refuseUnusedRounding, type FormulaOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { declareMass } from './declarations.js';
import { decimalCell } from '../output/format.js';

interface MassCliOptions extends FormulaOptions, RoundingOptions {
  uncertainty?: boolean;
}

/** A mass result, with its uncertainty when asked for. */
export interface MassRow {
  mass: MassDetail;
  u: MolarMassUncertainty | null;
}

const columns = [...MASS_COLUMNS];
const head = ['input', 'formula (Hill)', 'molar mass g/mol', 'monoisotopic u', 'nominal', 'charge'];
const align: ('left' | 'right')[] = ['left', 'left', 'right', 'right', 'right', 'right'];
const cells = (r: MassDetail) => massCells(plainMass(r));
const rowWith = (rounding: 'half-even' | 'half-up') => (r: MassDetail) => [r.input, r.formula, displayMolarMass(r, rounding), displayMonoisotopic(r), r.nominalMass ?? '—', chargeLabel(r.charge)];

/** The presenter for `pondus mass` (with --uncertainty, {@link uncertaintyPresenter}). */
export function massPresenter(o: MassCliOptions): Presenter<MassDetail> | Presenter<MassRow> {
  if (o.uncertainty && o.weights === 'abridged') throw fail({ code: 'USAGE', message: '--uncertainty comes from the standard atomic weights and their intervals, not from the abridged table: drop --weights abridged or --uncertainty' });
  refuseUnusedRounding(o);
  return o.uncertainty ? uncertaintyPresenter(o) : plainPresenter(o);
}

function plainPresenter(o: MassCliOptions): Presenter<MassDetail> {
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations };
  return {
    compute: (input) => formulaMassDetail(input, opts),
    json: (r) => massJson(plainMass(r)),
    jsonLine: (r) => massJsonLine(plainMass(r)),
    jsonRow: (input, line) => massJsonLine(formulaMass(input, opts), line),
    columns,
    cells,
    table: { head, align, row: rowWith(o.rounding ?? 'half-even') },
    notes: (r) => r.notes,
    noteItems: (r) => r.notes,
  };
}

function uncertaintyPresenter(o: MassCliOptions): Presenter<MassRow> {
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations };
  return {
    compute: (input) => {
      const mass = formulaMassDetail(input, opts);
      return { mass, u: molarMassUncertainty(mass) };
    },
    json: (r) => massUncertaintyJson(plainMass(r.mass), r.u!),
    columns: [...columns, 'uncertaintyValue', 'standardUncertainty'],
    cells: (r) => [...cells(r.mass), decimalCell(r.u!.value), decimalCell(r.u!.standardUncertainty)],
    table: {
      head: [...head, 'M ± u g/mol (k = 1)'],
      align: [...align, 'right'],
      row: (r) => [...rowWith(o.rounding ?? 'half-even')(r.mass), formatWithUncertainty(r.u!.value, r.u!.standardUncertainty)],
    },
    notes: (r) => r.mass.notes,
    noteItems: (r) => r.mass.notes,
    caution: UNCERTAINTY_BASIS,
  };
}

/** Registers `pondus mass`. */
export function registerMass(program: Command, run: CommandRunner): void {
  declareMass(program).action((formulas: string[], o: MassCliOptions) => run('mass', formulas, o));
}
