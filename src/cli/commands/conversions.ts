import { notesJson } from '../../errors/note-json.js';
import type { Command } from 'commander';
import { fail } from '../../errors/pondus-error.js';
import { convertBasis, type BasisResult } from '../../preparation/basis.js';
import type { ConversionFactor } from '../../preparation/conversion-factor.js';
import { BENCH_CAUTION, DOSE_CAUTION } from '../../preparation/caution.js';
import { dilute, type DilutionResult } from '../../preparation/dilution.js';
import { dilutionJson } from '../../preparation/dilution-json.js';
import { gravimetric, type GravimetricResult } from '../../preparation/gravimetric.js';
import { gravimetricJson } from '../../preparation/gravimetric-json.js';
import { basisJson } from '../../preparation/basis-json.js';
import { displayInstruction, displayResult, instruction, volumeUnitFor, type Instruction } from '../../sigfig/instruction.js';
import { saltFactor, type SaltFactorResult } from '../../preparation/salt-factor.js';
import { saltFactorJson } from '../../preparation/salt-factor-json.js';
import type { Quantity } from '../../sigfig/quantity.js';
import { displayMeasured, type RoundingMode } from '../../sigfig/round.js';
import { speciesText } from '../../preparation/species.js';
import type { Presenter } from '../output/presenter.js';
import { roundingOf, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { checkDilutePlanOptions, massDilutionPresenter, seriesPresenter, type DilutePlanCliOptions } from './dilute-plans.js';
import type { SeriesResult } from '../../preparation/dilution-series.js';
import type { MassDilutionResult } from '../../preparation/mass-dilution.js';
import { declareConversions } from './declarations.js';
import { decimalCell } from '../output/format.js';

const factorText = (f: ConversionFactor) => `${f.a === 1n ? '' : `${f.a} × `}M(${speciesText(f.sought)}) / ${f.b === 1n ? `M(${speciesText(f.given)})` : `(${f.b} × M(${speciesText(f.given)}))`}`;

/** Text and value helpers for one rounding mode. */
function shows(rounding: RoundingMode) {
  const text = (q: Quantity | null, unit?: string) => (q ? displayResult(q, unit ?? q.unit?.symbol, rounding).text : null);
  const ins = (i: Instruction | null, unit?: string) => (i ? displayInstruction(i, unit ?? i.quantity.unit?.symbol, rounding).text : null);
  const factor = (f: ConversionFactor) => displayMeasured(f.reported, rounding).text;
  return { text, ins, factor };
}

// --- dilute -------------------------------------------------------------------

type DiluteCliOptions = DilutePlanCliOptions;

/** The presenter for `pondus dilute` (a serial plan with --series, by mass with --mass). */
export function dilutePresenter(o: DiluteCliOptions): Presenter<DilutionResult> | Presenter<SeriesResult> | Presenter<MassDilutionResult> {
  checkDilutePlanOptions(o);
  if (o.mass !== undefined) return massDilutionPresenter(o);
  if (o.series) return seriesPresenter(o);
  return oneStepPresenter(o);
}

function oneStepPresenter(o: DiluteCliOptions): Presenter<DilutionResult> {
  if (o.volume === undefined || (o.to === undefined && o.taken === undefined)) {
    throw fail({ code: 'USAGE', message: "give --to (the target concentration) and --volume (the final volume): pondus dilute '1.00 M' --to '0.100 M' --volume '250.0 mL'; or --taken and --volume for the concentration made" });
  }
  const rounding = roundingOf(o);
  const { text, ins } = shows(rounding);
  // in equivalents the concentration made is a number in the stock's unit as written
  const madeText = (r: DilutionResult) => (r.made && r.madeUnit !== null ? `${text(r.made)} ${r.madeUnit}` : text(r.made));
  const vUnit = (r: DilutionResult) => (r.stockVolume ? volumeUnitFor(r.stockVolume.quantity, r.finalVolume.unit) : undefined);
  return {
    compute: (stock) => dilute(stock, o.to, o.volume!, o.taken),
    json: (r) => dilutionJson(r, rounding),
    columns: ['input', 'target', 'finalVolume', 'stockVolume', 'display', 'made'],
    cells: (r) => [r.written.stock, r.written.target, r.written.volume, r.stockVolume ? decimalCell(r.stockVolume.quantity.value) : '', ins(r.stockVolume, vUnit(r)), madeText(r)],
    block: (r) => {
      const lines: string[] = [];
      if (r.target && r.stockVolume) {
        lines.push(`C1·V1 = C2·V2: ${r.written.stock} → ${r.written.target} in ${r.written.volume} (dilution factor ${displayInstruction(instruction(r.factor, []), null, rounding).figure})`);
        lines.push(`  take ${ins(r.stockVolume, vUnit(r))} of the stock and make up to ${r.written.volume} (about ${ins(r.solventVolume)} of solvent; volumes need not add up exactly)`);
      }
      if (r.made) lines.push(`${lines.length ? '  ' : ''}made: ${r.written.taken} of ${r.written.stock} made up to ${r.written.volume} gives ${madeText(r)}`);
      return lines.join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}

// --- gravimetric ----------------------------------------------------------------

interface GravimetricCliOptions extends OutputOptions, RoundingOptions {
  weighed?: string;
  mass?: string;
  sample?: string;
  element?: string;
}

/** The presenter for `pondus gravimetric`. */
export function gravimetricPresenter(o: GravimetricCliOptions): Presenter<GravimetricResult> {
  if (o.sample !== undefined && o.mass === undefined) throw fail({ code: 'USAGE', message: '--sample needs --mass: the mass fraction in the sample comes from the mass of the weighed form' });
  const rounding = roundingOf(o);
  const { text, factor } = shows(rounding);
  return {
    compute: (analyte) => gravimetric(analyte, o.weighed!, { element: o.element, weighedMass: o.mass, sampleMass: o.sample }),
    json: (r) => gravimetricJson(r, rounding),
    columns: ['analyte', 'weighed', 'factor', 'analyteMass', 'massPercent', 'analyteHill', 'weighedHill'],
    cells: (r) => [speciesText(r.factor.sought), speciesText(r.factor.given), decimalCell(r.factor.factor), r.analyteMass ? displayResult(r.analyteMass, 'g', rounding).figure : '', r.massPercent ? displayResult(r.massPercent, null, rounding).figure : '', r.factor.sought.formula, r.factor.given.formula],
    block: (r) => {
      const lines = [`gravimetric factor for ${r.factor.sought.input} weighed as ${r.factor.given.input}: ${factorText(r.factor)} = ${factor(r.factor)}`];
      if (r.analyteMass) lines.push(`  ${r.factor.sought.input} in the weighed form: ${text(r.analyteMass, 'g')}`);
      if (r.massPercent) lines.push(`  in the sample: ${displayResult(r.massPercent, null, rounding).figure} % by mass`);
      return lines.join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => notesJson(r.notes),
  };
}

// --- basis (element ↔ oxide) --------------------------------------------------

interface BasisCliOptions extends OutputOptions, RoundingOptions {
  to?: string;
  value?: string;
  element?: string;
}

/** The presenter for `pondus basis`. */
export function basisPresenter(o: BasisCliOptions): Presenter<BasisResult> {
  const rounding = roundingOf(o);
  const { text, factor } = shows(rounding);
  return {
    compute: (from) => convertBasis(from, o.to!, { element: o.element, value: o.value }),
    json: (r) => basisJson(r, rounding),
    columns: ['from', 'to', 'factor', 'converted', 'fromHill', 'toHill'],
    cells: (r) => [speciesText(r.factor.given), speciesText(r.factor.sought), decimalCell(r.factor.factor), r.converted ? text(r.converted) : '', r.factor.given.formula, r.factor.sought.formula],
    block: (r) => {
      const lines = [`${r.factor.given.input} → ${r.factor.sought.input}: × ${factor(r.factor)}   (${factorText(r.factor)})`];
      if (r.converted) lines.push(`  ${text(r.value)} ${r.factor.given.input} = ${text(r.converted)} ${r.factor.sought.input}`);
      return lines.join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => notesJson(r.notes),
  };
}

// --- salt/parent --------------------------------------------------------------

interface SaltCliOptions extends OutputOptions, RoundingOptions {
  parent?: string;
  dose?: string;
  saltMass?: string;
}

/** The presenter for `pondus salt`. */
export function saltPresenter(o: SaltCliOptions): Presenter<SaltFactorResult> {
  const rounding = roundingOf(o);
  const { text, ins } = shows(rounding);
  const given = { parentMass: o.dose, saltMass: o.saltMass };
  return {
    compute: (salt) => saltFactor(salt, o.parent!, given),
    json: (r) => saltFactorJson(r, given, rounding),
    columns: ['salt', 'parent', 'factor', 'saltMass', 'parentMass', 'saltHill', 'parentHill'],
    cells: (r) => [speciesText(r.salt), speciesText(r.parent), decimalCell(r.factor), ins(r.saltMass), text(r.parentMass), r.salt.formula, r.parent.formula],
    block: (r) => {
      const lines = [`${r.salt.input} / ${r.parent.input}: ${displayMeasured(r.reported, rounding).text} g of salt per g of parent${r.perSalt.eq(1) ? '' : ` (${r.perSalt.toFixed()} parent units per salt unit)`}`];
      if (r.saltMass) lines.push(`  ${o.dose!.trim()} of parent is carried by ${ins(r.saltMass)} of the salt`);
      if (r.parentMass) lines.push(`  ${o.saltMass!.trim()} of the salt carries ${text(r.parentMass)} of parent`);
      return lines.join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => notesJson(r.notes),
    caution: DOSE_CAUTION,
  };
}

/** Registers `pondus dilute`, `gravimetric`, `basis` and `salt`. */
export function registerConversions(program: Command, run: CommandRunner, only?: string): void {
  const c = declareConversions(program, only);
  c.dilute?.action((inputs: string[], o: DiluteCliOptions) => run('dilute', inputs, o));
  c.gravimetric?.action((inputs: string[], o: GravimetricCliOptions) => run('gravimetric', inputs, o));
  c.basis?.action((inputs: string[], o: BasisCliOptions) => run('basis', inputs, o));
  c.salt?.action((inputs: string[], o: SaltCliOptions) => run('salt', inputs, o));
}

