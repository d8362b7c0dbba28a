import type { Command } from 'commander';
import { fail } from '../../errors/pondus-error.js';
import { measureAs, MASS, PURE } from '../../calc/measure.js';
import { conversionFactor, type ConversionFactor } from '../../preparation/conversion-factor.js';
import { BENCH_CAUTION, DOSE_CAUTION } from '../../preparation/caution.js';
import { dilute, type DilutionResult } from '../../preparation/dilution.js';
import { gravimetric, type GravimetricResult } from '../../preparation/gravimetric.js';
import { saltFactor, type SaltFactorResult } from '../../preparation/salt-factor.js';
import { displayQuantity } from '../../sigfig/display-quantity.js';
import { multiply, quantity, type Quantity } from '../../sigfig/quantity.js';
import { displayMeasured } from '../../sigfig/round.js';
import type { Presenter } from '../output/presenter.js';
import { withOutputOptions, type OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';

const text = (q: Quantity | null, unit?: string) => (q ? displayQuantity(q, unit ?? q.unit?.symbol).text : null);
const value = (q: Quantity | null, unit?: string) => (q ? displayQuantity(q, unit ?? q.unit?.symbol).value.toNumber() : null);
const factorText = (f: ConversionFactor) => `${f.a === 1n ? '' : `${f.a} × `}M(${f.sought.input}) / ${f.b === 1n ? `M(${f.given.input})` : `(${f.b} × M(${f.given.input}))`}`;

// --- dilute -------------------------------------------------------------------

interface DiluteCliOptions extends OutputOptions {
  to?: string;
  volume?: string;
}

/** The presenter for `pondus dilute`. */
export function dilutePresenter(o: DiluteCliOptions): Presenter<DilutionResult> {
  return {
    compute: (stock) => {
      if (o.to === undefined || o.volume === undefined) throw fail({ code: 'USAGE', message: "give --to (the target concentration) and --volume (the final volume): pondus dilute '1.00 M' --to '0.100 M' --volume '250.0 mL'" });
      return dilute(stock, o.to, o.volume);
    },
    json: (r) => ({ stock: text(r.stock), target: text(r.target), finalVolume: text(r.finalVolume), stockVolume: value(r.stockVolume), stockVolumeDisplay: text(r.stockVolume), factor: value(r.factor), caution: BENCH_CAUTION }),
    columns: ['stock', 'target', 'finalVolume', 'stockVolume', 'display'],
    cells: (r) => [text(r.stock), text(r.target), text(r.finalVolume), value(r.stockVolume), text(r.stockVolume)],
    block: (r) =>
      [
        `C1·V1 = C2·V2: ${text(r.stock)} → ${text(r.target)} in ${text(r.finalVolume)} (dilution factor ${displayQuantity(r.factor).figure})`,
        `  take ${text(r.stockVolume)} of the stock and make up to ${text(r.finalVolume)} (about ${text(r.solventVolume)} of solvent; volumes need not add up exactly)`,
      ].join('\n'),
    notes: (r) => r.notes.map((n) => n.message),
    caution: BENCH_CAUTION,
  };
}

// --- gravimetric ----------------------------------------------------------------

interface GravimetricCliOptions extends OutputOptions {
  weighed?: string;
  mass?: string;
  sample?: string;
  element?: string;
}

/** The presenter for `pondus gravimetric`. */
export function gravimetricPresenter(o: GravimetricCliOptions): Presenter<GravimetricResult> {
  return {
    compute: (analyte) => {
      if (o.weighed === undefined) throw fail({ code: 'USAGE', message: 'give the weighed form: --weighed Fe2O3' });
      return gravimetric(analyte, o.weighed, { element: o.element, weighedMass: o.mass, sampleMass: o.sample });
    },
    json: (r) => ({
      analyte: r.factor.sought.formula,
      weighed: r.factor.given.formula,
      element: r.factor.element,
      factor: r.factor.factor.toNumber(),
      factorDisplay: displayMeasured(r.factor.reported).text,
      analyteMass: value(r.analyteMass, 'g'),
      analyteMassDisplay: text(r.analyteMass, 'g'),
      massPercent: r.massPercent ? r.massPercent.value.times(1).toNumber() : null,
      massPercentDisplay: r.massPercent ? displayQuantity(r.massPercent).figure : null,
    }),
    columns: ['analyte', 'weighed', 'factor', 'analyteMass', 'massPercent'],
    cells: (r) => [r.factor.sought.formula, r.factor.given.formula, r.factor.factor.toFixed(), r.analyteMass ? displayQuantity(r.analyteMass, 'g').value.toFixed() : '', r.massPercent ? r.massPercent.value.toFixed() : ''],
    block: (r) => {
      const lines = [`gravimetric factor for ${r.factor.sought.input} weighed as ${r.factor.given.input}: ${factorText(r.factor)} = ${displayMeasured(r.factor.reported).text}`];
      if (r.analyteMass) lines.push(`  ${r.factor.sought.input} in the weighed form: ${text(r.analyteMass, 'g')}`);
      if (r.massPercent) lines.push(`  in the sample: ${displayQuantity(r.massPercent).figure} % by mass`);
      return lines.join('\n');
    },
    notes: (r) => r.notes.map((n) => n.message),
  };
}

// --- basis (element ↔ oxide) --------------------------------------------------

interface BasisCliOptions extends OutputOptions {
  to?: string;
  value?: string;
  element?: string;
}

interface BasisResult {
  factor: ConversionFactor;
  value: Quantity | null;
  converted: Quantity | null;
}

/** The presenter for `pondus basis`. */
export function basisPresenter(o: BasisCliOptions): Presenter<BasisResult> {
  return {
    compute: (from) => {
      if (o.to === undefined) throw fail({ code: 'USAGE', message: 'give the basis to convert to: --to P (or --to P2O5, K2O, SiO2, …)' });
      const factor = conversionFactor(o.to, from, o.element);
      let v: Quantity | null = null;
      let converted: Quantity | null = null;
      if (o.value !== undefined) {
        v = measureAs(o.value, [MASS, PURE], 'the value');
        converted = multiply(v, quantity(factor.reported, null));
      }
      return { factor, value: v, converted };
    },
    json: (r) => ({
      from: r.factor.given.formula,
      to: r.factor.sought.formula,
      factor: r.factor.factor.toNumber(),
      factorDisplay: displayMeasured(r.factor.reported).text,
      value: text(r.value),
      converted: value(r.converted),
      convertedDisplay: text(r.converted),
    }),
    columns: ['from', 'to', 'factor', 'converted'],
    cells: (r) => [r.factor.given.formula, r.factor.sought.formula, r.factor.factor.toFixed(), r.converted ? text(r.converted) : ''],
    block: (r) => {
      const lines = [`${r.factor.given.input} → ${r.factor.sought.input}: × ${displayMeasured(r.factor.reported).text}   (${factorText(r.factor)})`];
      if (r.converted) lines.push(`  ${text(r.value)} ${r.factor.given.input} = ${text(r.converted)} ${r.factor.sought.input}`);
      return lines.join('\n');
    },
  };
}

// --- salt/parent --------------------------------------------------------------

interface SaltCliOptions extends OutputOptions {
  parent?: string;
  dose?: string;
  saltMass?: string;
}

/** The presenter for `pondus salt`. */
export function saltPresenter(o: SaltCliOptions): Presenter<SaltFactorResult> {
  return {
    compute: (salt) => {
      if (o.parent === undefined) throw fail({ code: 'USAGE', message: 'give the parent compound: --parent C17H19NO3' });
      return saltFactor(salt, o.parent, { parentMass: o.dose, saltMass: o.saltMass });
    },
    json: (r) => ({
      salt: r.salt.formula,
      parent: r.parent.formula,
      factor: r.factor.toNumber(),
      factorDisplay: displayMeasured(r.reported).text,
      saltMass: value(r.saltMass, r.saltMass?.unit?.symbol),
      saltMassDisplay: text(r.saltMass),
      parentMass: value(r.parentMass, r.parentMass?.unit?.symbol),
      parentMassDisplay: text(r.parentMass),
      caution: DOSE_CAUTION,
    }),
    columns: ['salt', 'parent', 'factor', 'saltMass', 'parentMass'],
    cells: (r) => [r.salt.formula, r.parent.formula, r.factor.toFixed(), text(r.saltMass), text(r.parentMass)],
    block: (r) => {
      const lines = [`${r.salt.input} / ${r.parent.input}: ${displayMeasured(r.reported).text} g of salt per g of parent${r.perSalt.eq(1) ? '' : ` (${r.perSalt.toFixed()} parent units per salt unit)`}`];
      if (r.saltMass) lines.push(`  ${o.dose} of parent is carried by ${text(r.saltMass)} of the salt`);
      if (r.parentMass) lines.push(`  ${o.saltMass} of the salt carries ${text(r.parentMass)} of parent`);
      return lines.join('\n');
    },
    caution: DOSE_CAUTION,
  };
}

/** Registers `pondus dilute`, `gravimetric`, `basis` and `salt`. */
export function registerConversions(program: Command, run: CommandRunner): void {
  withOutputOptions(
    program
      .command('dilute')
      .description('dilution, C1·V1 = C2·V2: how much stock to take')
      .argument('[stock...]', "stock concentration, e.g. '1.00 M'")
      .option('--to <c>', "target concentration, e.g. '0.100 M'")
      .option('--volume <v>', "final volume, e.g. '250.0 mL'"),
  ).action((inputs: string[], o: DiluteCliOptions) => run('dilute', inputs, o));
  withOutputOptions(
    program
      .command('gravimetric')
      .description('gravimetric factor (IUPAC Gold Book), analyte mass from the weighed form, and its mass fraction')
      .argument('[analytes...]', 'what is sought: Fe, Cl, SO4, P2O5, …')
      .option('--weighed <form>', 'the form weighed: Fe2O3, AgCl, BaSO4, Mg2P2O7, …')
      .option('--mass <m>', "mass of the weighed form: '0.2345 g'")
      .option('--sample <m>', "mass of the sample taken: '1.0012 g'")
      .option('--element <symbol>', 'the element the factor rests on, when the two share several'),
  ).action((inputs: string[], o: GravimetricCliOptions) => run('gravimetric', inputs, o));
  withOutputOptions(
    program
      .command('basis')
      .description('convert between an element and its oxide basis (P ↔ P2O5, K ↔ K2O, Si ↔ SiO2, …)')
      .argument('[from...]', 'the basis a value is given on: P2O5, K2O, SiO2, Al2O3, P, K, …')
      .option('--to <formula>', 'the basis to convert to')
      .option('--value <v>', "the value to convert: '12.5 %', '3.40 g'")
      .option('--element <symbol>', 'the element the conversion rests on, when the two share several'),
  ).action((inputs: string[], o: BasisCliOptions) => run('basis', inputs, o));
  withOutputOptions(
    program
      .command('salt')
      .description('salt/parent factor of a salt form, and masses either way')
      .argument('[salts...]', 'the salt, written parent·acid: C17H19NO3·HCl·3H2O')
      .option('--parent <formula>', 'the parent compound (free base or acid)')
      .option('--dose <m>', "a mass of parent: the salt mass that carries it, e.g. '10.0 mg'")
      .option('--salt-mass <m>', "a mass of salt: the parent mass it carries"),
  ).action((inputs: string[], o: SaltCliOptions) => run('salt', inputs, o));
}
