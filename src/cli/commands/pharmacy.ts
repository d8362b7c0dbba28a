/**
 * The compounding commands: `meq` (mmol, mEq and mOsm of a salt from a mass,
 * a target or a strength), `osmolarity` (mOsm/L and mEq/L of a solution of
 * salts and non-electrolytes) and `alligation` (two strengths mixed to a target).
 */
import { hillAside, speciesText } from '../../preparation/species.js';
import type { Command } from 'commander';
import { fail, PondusError } from '../../errors/pondus-error.js';
import type { Issue } from '../../errors/issue.js';
import { alligation, type AlligationResult } from '../../pharmacy/alligation.js';
import { PHARMACY_CAUTION, POTENCY_CAUTION } from '../../pharmacy/caution.js';
import { milliequivalents, type MilliequivalentOptions, type MilliequivalentResult } from '../../pharmacy/milliequivalents.js';
import { osmolarity, type OsmolarityOptions, type OsmolarityResult } from '../../pharmacy/osmolarity.js';
import { meqJson } from '../../pharmacy/milliequivalents-json.js';
import { osmolarityJson } from '../../pharmacy/osmolarity-json.js';
import { alligationJson, alligationUnit } from '../../pharmacy/alligation-json.js';
import { potencyJson } from '../../pharmacy/potency-json.js';
import { strengthFormsShown, strengthJson, strengthRatioText } from '../../pharmacy/ratio-strength-json.js';
import type { RoundingMode } from '../../sigfig/round.js';
import { displayMolarMass } from '../output/display.js';
import type { FormulaOptions, OutputOptions } from './common.js';
import { notesJson, numbered, qtext, reportedIn, type RowPresenter } from './qc-rows.js';
import { ANIONS, CATIONS } from '../../pharmacy/ions.js';
import { potency, type PotencyOptions, type PotencyResult } from '../../pharmacy/potency.js';
import { strengthForms, type StrengthForms } from '../../pharmacy/ratio-strength.js';
import { readBasis, unusedContents } from '../../assay/sample-basis.js';
import { displayInstruction, massUnitFor } from '../../sigfig/instruction.js';
import type { CommandRunner } from './runner.js';
import { declarePharmacy } from './declarations.js';
import { decimalCell } from '../output/format.js';
import { inUnitOf, unitOf } from '../../sigfig/units.js';
import type { Quantity } from '../../sigfig/quantity.js';

/** A number cell of CSV/TSV: the exact decimal of the value in the column's unit (the README's CSV rule), not the display text. */
function numberCell(q: Quantity, unit: string): string {
  return decimalCell(inUnitOf(q.value, unitOf(unit)));
}

// --- meq --------------------------------------------------------------------------

export interface MeqCli extends FormulaOptions, Pick<MilliequivalentOptions, 'mass' | 'meq' | 'mmol' | 'concentration' | 'measured' | 'ions'> {
  rounding?: RoundingMode;
}

/** The presenter for `pondus meq`. */
export function meqPresenter(o: MeqCli): RowPresenter<MilliequivalentResult> {
  const given = (['mass', 'meq', 'mmol', 'concentration'] as const).filter((k) => o[k] !== undefined);
  if (given.length !== 1) throw fail({ code: 'USAGE', message: given.length === 0 ? "give one of --mass '1.000 g', --meq '20 mEq', --mmol '10 mmol' or --concentration '10 % w/v'" : `give only one of ${given.map((k) => `--${k}`).join(', ')}` });
  if (o.measured && o.concentration === undefined) throw fail({ code: 'USAGE', message: '--measured applies to --concentration only' });
  const rounding = o.rounding ?? 'half-even';
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations, mass: o.mass, meq: o.meq, mmol: o.mmol, concentration: o.concentration, measured: o.measured, ions: o.ions };
  const strength = o.concentration !== undefined;
  return {
    compute: numbered((input) => milliequivalents(input, opts)),
    json: ({ input, r }) => meqJson(r, input, rounding),
    columns: strength ? ['input', 'line', 'salt', 'mmol_per_mL', 'mEq_per_mL', 'mEq_per_L', 'mOsm_per_L', 'saltHill'] : ['input', 'line', 'salt', 'mass_g', 'mmol', 'mEq', 'mOsm', 'saltHill'],
    cells: ({ input, line, r }) =>
      strength
        ? [input, line, speciesText(r.salt), numberCell(r.moles, 'M'), numberCell(r.equivalents, 'M'), numberCell(r.equivalents, 'mM'), numberCell(r.osmoles, 'mM'), r.salt.formula]
        : [input, line, speciesText(r.salt), numberCell(r.mass!, 'g'), numberCell(r.moles, 'mmol'), numberCell(r.equivalents, 'mmol'), numberCell(r.osmoles, 'mmol'), r.salt.formula],
    block: ({ input, r }) => {
      const head = `${input}  (${hillAside(r.salt)}M = ${displayMolarMass(r.salt)} g/mol): 1 mmol = ${r.ions.equivalentsPerMole} mEq = ${r.ions.particles} mOsm`;
      const ions = r.perIon.map((i) => `${i.ion} ${strength ? qtext(i.equivalents, 'mM', rounding, 'mEq/L') : qtext(i.equivalents, 'mmol', rounding, 'mEq')}`).join(', ');
      if (r.mode === 'strength') {
        return [head, `  ${o.concentration}: ${qtext(r.moles, 'M', rounding, 'mmol/mL')}, ${qtext(r.equivalents, 'M', rounding, 'mEq/mL')} (${qtext(r.equivalents, 'mM', rounding, 'mEq/L')}), ${qtext(r.osmoles, 'mM', rounding, 'mOsm/L')}`, `  by ion: ${ions}`].join('\n');
      }
      if (r.mode === 'target') {
        return [head, `  for ${o.meq ?? o.mmol}: ${qtext(r.moles, 'mmol', rounding)} of ${input}; weigh ${qtext(r.mass!, 'g', rounding)}`, `  by ion: ${ions}`].join('\n');
      }
      return [head, `  ${qtext(r.mass!, 'g', rounding)}: ${qtext(r.moles, 'mmol', rounding)}, ${qtext(r.equivalents, 'mmol', rounding, 'mEq')}, ${qtext(r.osmoles, 'mmol', rounding, 'mOsm')}`, `  by ion: ${ions}`].join('\n');
    },
    notes: ({ r }) => r.notes,
    noteItems: ({ r }) => notesJson(r.notes),
    caution: PHARMACY_CAUTION,
  };
}

// --- osmolarity -------------------------------------------------------------------

const TABLE_IONS = [...CATIONS, ...ANIONS].map((i) => i.formula);

export interface OsmolarityCli extends FormulaOptions {
  measured?: boolean;
  rounding?: RoundingMode;
}

/**
 * The osmolarity of a solution, or, when it fails, every solute's problem: the library stops at the
 * first solute that cannot be worked, so each later solute is worked on its own too, and its
 * problem (its first issue, its column made a column of the whole list) joins the first. What only
 * the whole list shows (a solute given twice) is the first problem when it is, and is not looked
 * for past it.
 *
 * @example
 * solutionOrEveryProblem('Xx=1 %, KCl=abc', {}) // throws UNKNOWN_ELEMENT (column 1) and UNKNOWN_UNIT (column 13)
 */
export function solutionOrEveryProblem(text: string, opts: OsmolarityOptions): OsmolarityResult {
  try {
    return osmolarity(text, opts);
  } catch (e) {
    if (!(e instanceof PondusError) || e.input !== text || e.first.column === undefined || e.first.code === 'USAGE') throw e;
    const issues: Issue[] = [e.first];
    // the pieces as the solution list is cut: at commas and semicolons, each trimmed
    for (const m of text.matchAll(/[^;,]+/g)) {
      const piece = m[0].trim();
      const column = m.index + (m[0].length - m[0].trimStart().length) + 1;
      if (piece === '' || column <= e.first.column) continue;
      try {
        osmolarity(piece, opts);
      } catch (alone) {
        if (!(alone instanceof PondusError) || alone.first.code === 'USAGE') continue;
        const i = alone.first;
        const at = i.column === undefined ? column : column + i.column - 1;
        const message = i.column === undefined ? i.message : i.message.replace(`at column ${i.column}`, `at column ${at}`);
        issues.push({ ...i, message, column: at });
      }
    }
    if (issues.length === 1) throw e;
    throw new PondusError(issues, text, e.notes);
  }
}

/** The presenter for `pondus osmolarity`. */
export function osmolarityPresenter(o: OsmolarityCli): RowPresenter<OsmolarityResult> {
  const rounding = o.rounding ?? 'half-even';
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations, measured: o.measured };
  return {
    compute: numbered((input) => solutionOrEveryProblem(input, opts)),
    json: ({ input, r }) => osmolarityJson(r, input, rounding),
    // one column per ion of the table (wide form): an ion a solution does not hold is left empty
    // the total, its parts from salts and from non-electrolytes (empty when there is none), then by ion
    columns: ['input', 'line', 'mOsm_per_L', 'salt_mOsm_per_L', 'nonelectrolyte_mOsm_per_L', ...TABLE_IONS.map((i) => `${i}_mEq_per_L`)],
    cells: ({ input, line, r }) => [
      input,
      line,
      numberCell(r.osmolarity, 'mM'),
      r.saltOsmolarity ? numberCell(r.saltOsmolarity, 'mM') : '',
      r.nonElectrolyteOsmolarity ? numberCell(r.nonElectrolyteOsmolarity, 'mM') : '',
      ...TABLE_IONS.map((f) => {
        const ion = r.ions.find((i) => i.ion.replace(/\^.*$/, '') === f);
        return ion ? numberCell(ion.equivalents, 'mM') : '';
      }),
    ],
    block: ({ input, r }) => {
      const lines = [`${input}`];
      for (const c of r.components) lines.push(`  ${c.solute} ${c.strength}: ${qtext(c.result.moles, 'mM', rounding, 'mmol/L')} × ${c.particles} = ${qtext(c.result.osmoles, 'mM', rounding, 'mOsm/L')}${c.kind === 'salt' ? '' : ' (non-electrolyte)'}`);
      const basis = !r.nonElectrolyteOsmolarity ? 'complete dissociation' : !r.saltOsmolarity ? 'one particle per molecule' : 'complete dissociation of the salts';
      lines.push(`  osmolarity ${qtext(r.osmolarity, 'mM', rounding, 'mOsm/L')} (ideal, ${basis})`);
      lines.push(`  mEq/L: ${r.ions.length === 0 ? 'none (no salt)' : r.ions.map((i) => `${i.ion} ${qtext(i.equivalents, 'mM', rounding, '')}`.trimEnd()).join(', ')}`);
      return lines.join('\n');
    },
    notes: ({ r }) => r.notes,
    noteItems: ({ r }) => notesJson(r.notes),
    caution: PHARMACY_CAUTION,
  };
}

// --- alligation -------------------------------------------------------------------

export interface AlligationCli extends OutputOptions {
  higher?: string;
  lower?: string;
  total?: string;
  by?: 'mass' | 'volume';
  rounding?: RoundingMode;
}

/** The presenter for `pondus alligation`. */
export function alligationPresenter(o: AlligationCli): RowPresenter<AlligationResult> {
  const missing = (['higher', 'lower'] as const).filter((k) => o[k] === undefined);
  if (missing.length) throw fail({ code: 'USAGE', message: `give ${missing.map((k) => `--${k}`).join(' and ')}: pondus alligation '10 %' --higher '20 %' --lower '5 %' --total '300 g'` });
  if (o.total === undefined && o.by === undefined) throw fail({ code: 'USAGE', message: "say how the strengths are mixed: --total '500 g' (by mass) or --total '250 mL' (by volume), or --by mass|volume for parts only" });
  if (o.by !== undefined && o.by !== 'mass' && o.by !== 'volume') throw fail({ code: 'USAGE', message: `--by is mass or volume; got '${o.by}'` });
  const rounding = o.rounding ?? 'half-even';
  const opts = { higher: o.higher!, lower: o.lower!, total: o.total, by: o.by };
  const amountUnit = alligationUnit;
  const sUnit = (r: AlligationResult) => r.target.value.unit?.symbol;
  return {
    compute: numbered((input) => {
      const r = alligation(input, opts);
      if (o.by !== undefined && r.total !== null && r.by !== o.by) throw fail({ code: 'USAGE', message: `--by ${o.by} conflicts with the total` });
      return r;
    }),
    json: ({ input, r }) => alligationJson(r, input, rounding),
    columns: ['input', 'line', 'by', 'higher_parts', 'lower_parts', 'higher_amount', 'lower_amount', 'unit'],
    cells: ({ input, line, r }) => [
      input,
      line,
      r.by,
      reportedIn({ ...r.higherParts, lsd: null }, sUnit(r), rounding).value,
      reportedIn({ ...r.lowerParts, lsd: null }, sUnit(r), rounding).value,
      r.higherAmount ? reportedIn(r.higherAmount, amountUnit(r), rounding).reported : '',
      r.lowerAmount ? reportedIn(r.lowerAmount, amountUnit(r), rounding).reported : '',
      r.total ? amountUnit(r) : '',
    ],
    block: ({ input, r }) => {
      const u = sUnit(r);
      const hp = qtext({ ...r.higherParts, lsd: null }, u, rounding);
      const lp = qtext({ ...r.lowerParts, lsd: null }, u, rounding);
      const parts = (t: string) => `${t.replace(/ .*/, '')} part${t.replace(/ .*/, '') === '1' ? '' : 's'}`;
      const lines = [`${o.higher} and ${o.lower} to ${input}, by ${r.by}: ${parts(hp)} of ${o.higher} to ${parts(lp)} of ${o.lower}`];
      if (r.total && r.higherAmount && r.lowerAmount) {
        const unit = amountUnit(r);
        lines.push(`  for ${o.total!.trim()}: take ${qtext(r.higherAmount, unit, rounding)} of ${o.higher} and ${qtext(r.lowerAmount, unit, rounding)} of ${o.lower}`);
      }
      return lines.join('\n');
    },
    notes: ({ r }) => r.notes,
    noteItems: ({ r }) => notesJson(r.notes),
    caution: PHARMACY_CAUTION,
  };
}

// --- potency ---------------------------------------------------------------------

export interface PotencyCli extends OutputOptions, Pick<PotencyOptions, 'water' | 'loss' | 'solvent' | 'need'> {
  basis?: string;
  rounding?: RoundingMode;
}

/** The presenter for `pondus potency`. */
export function potencyPresenter(o: PotencyCli): RowPresenter<PotencyResult> {
  const rounding = o.rounding ?? 'half-even';
  const basis = o.basis !== undefined ? readBasis(o.basis) : undefined;
  if (basis === undefined && (o.water !== undefined || o.loss !== undefined || o.solvent !== undefined)) {
    throw fail({ code: 'USAGE', message: '--water, --loss and --solvent convert a potency given on another basis: say which with --basis anhydrous, dried or solvent-free' });
  }
  const unused = basis === undefined ? [] : unusedContents(o, basis);
  if (unused.length) throw fail({ code: 'USAGE', message: `${unused.map((k) => `--${k}`).join(' and ')} would be ignored for a potency on the ${basis} basis: leave ${unused.length === 1 ? 'it' : 'them'} out, or give the --basis ${unused.length === 1 ? 'it belongs' : 'they belong'} to` });
  const unitOfGiven = (r: PotencyResult) => r.given.unit?.symbol ?? '%';
  const alt = (r: PotencyResult) => (unitOfGiven(r) === '%' ? 'µg/mg' : '%');
  return {
    compute: numbered((input) => potency(input, { basis, water: o.water, loss: o.loss, solvent: o.solvent, need: o.need })),
    json: ({ input, r }) => potencyJson(r, input, rounding, o.need ?? null),
    columns: ['input', 'line', 'basis', 'as_is', 'as_is_also', 'weigh_g', 'weigh'],
    cells: ({ input, line, r }) => [input, line, r.basis, qtext(r.asIs, unitOfGiven(r), rounding), qtext(r.asIs, alt(r), rounding), r.weigh ? decimalCell(r.weigh.quantity.value) : '', r.weigh ? displayInstruction(r.weigh, massUnitFor(r.weigh.quantity), rounding).text : ''],
    block: ({ input, r }) => {
      const lines = [`potency ${input}${r.basis === 'as-is' ? ' (as is)' : ` (${r.basis} basis)`}: ${qtext(r.asIs, unitOfGiven(r), rounding)} as is (${qtext(r.asIs, alt(r), rounding)})`];
      if (r.weigh) lines.push(`  for ${o.need!.trim()} of active: weigh ${displayInstruction(r.weigh, massUnitFor(r.weigh.quantity), rounding).text} of the material`);
      return lines.join('\n');
    },
    notes: ({ r }) => r.notes,
    noteItems: ({ r }) => notesJson(r.notes),
    caution: POTENCY_CAUTION,
  };
}

// --- strength (ratio strength, % w/v, mg/mL, mg/dL, % w/w, mg/kg) ------------------

export interface StrengthCli extends OutputOptions {
  rounding?: RoundingMode;
}

/** The presenter for `pondus strength`. */
export function strengthPresenter(o: StrengthCli): RowPresenter<StrengthForms> {
  const rounding = o.rounding ?? 'half-even';
  const ratioText = strengthRatioText;
  const shown = strengthFormsShown;
  // every form the table shows has its column (g/L last: the older columns keep their places)
  const cols = ['% w/v', 'mg/mL', 'mg/dL', '% w/w', 'mg/g', 'mg/kg', '% v/v', 'g/L'];
  return {
    compute: numbered((input) => strengthForms(input)),
    json: ({ input, r }) => strengthJson(r, input, rounding),
    columns: ['input', 'line', 'kind', 'ratio', ...cols.map((c) => c.replace('% ', 'percent_').replace('/', '_per_'))],
    cells: ({ input, line, r }) => {
      const f = shown(r);
      return [input, line, r.kind, ratioText(r), ...cols.map((c) => f.find((x) => x.unit === c)?.display.replace(` ${c}`, '') ?? '')];
    },
    block: ({ input, r }) => `${input} (${r.kind}): ${ratioText(r)} = ${shown(r).map((f) => f.display).join(' = ')}`,
    notes: ({ r }) => r.notes,
    noteItems: ({ r }) => notesJson(r.notes),
    caution: PHARMACY_CAUTION,
  };
}

// --- registration -----------------------------------------------------------------

/** Registers `meq`, `osmolarity` and `alligation`. */
export function registerPharmacy(program: Command, run: CommandRunner, only?: string): void {
  const c = declarePharmacy(program, only);
  c.meq?.action((inputs: string[], o: MeqCli) => run('meq', inputs, o));
  c.osmolarity?.action((inputs: string[], o: OsmolarityCli) => run('osmolarity', inputs, o));
  c.alligation?.action((inputs: string[], o: AlligationCli) => run('alligation', inputs, o));
  c.potency?.action((inputs: string[], o: PotencyCli) => run('potency', inputs, o));
  c.strength?.action((inputs: string[], o: StrengthCli) => run('strength', inputs, o));
}

/** Presenters of the compounding commands, by name. */
export const PHARMACY_PRESENTERS = {
  potency: (o: PotencyCli) => potencyPresenter(o),
  strength: (o: StrengthCli) => strengthPresenter(o),
  meq: (o: MeqCli) => (meqPresenter(o)),
  osmolarity: (o: OsmolarityCli) => (osmolarityPresenter(o)),
  alligation: (o: AlligationCli) => (alligationPresenter(o)),
};
