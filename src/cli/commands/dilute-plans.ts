/**
 * The two other shapes of `pondus dilute`: a serial dilution plan (`--series`)
 * and a dilution by mass of a solid or semisolid (`--mass`).
 */
import { notesJson } from '../../errors/note-json.js';
import { fail } from '../../errors/pondus-error.js';
import { BENCH_CAUTION } from '../../preparation/caution.js';
import { dilutionSeries, MAX_SERIES_STEPS, type SeriesResult } from '../../preparation/dilution-series.js';
import { diluteByMass, type MassDilutionResult } from '../../preparation/mass-dilution.js';
import { massDilutionJson, seriesJson } from '../../preparation/dilution-json.js';
import { displayInstruction, massUnitFor, volumeUnitFor, type Instruction } from '../../sigfig/instruction.js';
import type { RoundingMode } from '../../sigfig/round.js';
import type { Presenter } from '../output/presenter.js';
import { conflict, given, roundingOf, type OutputOptions, type RoundingOptions } from './common.js';
import { decimalCell } from '../output/format.js';

export interface DilutePlanCliOptions extends OutputOptions, RoundingOptions {
  to?: string;
  volume?: string;
  taken?: string;
  series?: boolean;
  minTransfer?: string;
  maxStep?: string;
  mass?: string;
}

const ratio = (d: { toSignificantDigits(n: number): { toFixed(): string } }) => `1:${d.toSignificantDigits(6).toFixed()}`;

/**
 * Checks the options of the serial and mass-basis shapes of `dilute` (usage errors, exit status 2).
 *
 * @example
 * checkDilutePlanOptions({ series: true, mass: '50 g' }) // throws USAGE
 */
export function checkDilutePlanOptions(o: DilutePlanCliOptions): void {
  if (o.mass !== undefined) {
    const clash = given(o, { volume: '--volume', taken: '--taken', series: '--series', minTransfer: '--min-transfer', maxStep: '--max-step' });
    if (clash.length) throw conflict('--mass', clash, 'a dilution by mass weighs the stronger material and the diluent; volumes do not come into it');
    if (o.to === undefined) throw fail({ code: 'USAGE', message: "give the target content: pondus dilute '10 % w/w' --to '2.5 % w/w' --mass '60.0 g'" });
    return;
  }
  if (o.series) {
    if (o.taken !== undefined) throw conflict('--series', ['--taken'], 'a plan gives the volumes to take; for the concentration made from one transfer, drop --series');
    if (o.volume === undefined) throw fail({ code: 'USAGE', message: "give the volume of each step: pondus dilute '1000 µg/mL' --to '1.000 µg/mL' --series --volume '10.00 mL'" });
    return;
  }
  const plan = given(o, { minTransfer: '--min-transfer', maxStep: '--max-step' });
  if (plan.length) throw fail({ code: 'USAGE', message: `${plan.join(' and ')} ${plan.length > 1 ? 'apply' : 'applies'} to a serial dilution plan: add --series` });
}

function show(rounding: RoundingMode) {
  return (i: Instruction, unit: string) => displayInstruction(i, unit, rounding).text;
}

/** The presenter for `pondus dilute --series`. */
export function seriesPresenter(o: DilutePlanCliOptions): Presenter<SeriesResult> {
  const rounding = roundingOf(o);
  const w = show(rounding);
  const vu = (r: SeriesResult, i: Instruction) => volumeUnitFor(i.quantity, r.volume.unit);
  const stepCols: string[] = [];
  for (let k = 1; k <= MAX_SERIES_STEPS; k++) stepCols.push(`step${k}_factor`, `step${k}_take_L`, `step${k}_take`);
  return {
    compute: (input) => (o.to !== undefined ? dilutionSeries({ stock: input, target: o.to, volume: o.volume!, minTransfer: o.minTransfer, maxStep: o.maxStep }) : dilutionSeries({ factor: input, volume: o.volume!, minTransfer: o.minTransfer, maxStep: o.maxStep })),
    json: (r) => seriesJson(r, rounding),
    columns: ['input', 'target', 'factor', 'volume', 'steps', ...stepCols],
    cells: (r) => {
      const cells: (string | number)[] = [r.written.stock ?? r.written.factor ?? '', r.written.target ?? '', decimalCell(r.factor), r.written.volume, r.steps.length];
      for (let k = 0; k < MAX_SERIES_STEPS; k++) {
        const s = r.steps[k];
        cells.push(s ? decimalCell(s.factor) : '', s ? decimalCell(s.take.quantity.value) : '', s ? w(s.take, vu(r, s.take)) : '');
      }
      return cells;
    },
    block: (r) => {
      const head = r.written.target ? `${r.written.stock} → ${r.written.target}: dilution ${ratio(r.factor)}` : `dilution ${ratio(r.factor)}`;
      const lines = [`${head}, in ${r.steps.length} step${r.steps.length === 1 ? '' : 's'} of ${r.written.volume} each`];
      for (const s of r.steps) {
        const from = s.step === 1 ? 'the stock' : `solution ${s.step - 1}`;
        const c = s.concentration ? ` → ${w(s.concentration, r.stock!.unit?.symbol ?? '')}` : '';
        lines.push(`  ${s.step}. ${ratio(s.factor)}: take ${w(s.take, vu(r, s.take))} of ${from}, make up to ${r.written.volume} (about ${w(s.diluent, r.volume.unit?.symbol ?? 'mL')} of diluent)${c}   [${ratio(s.cumulative)} overall]`);
      }
      return lines.join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}

/** The presenter for `pondus dilute --mass`. */
export function massDilutionPresenter(o: DilutePlanCliOptions): Presenter<MassDilutionResult> {
  const rounding = roundingOf(o);
  const w = show(rounding);
  const mu = (r: MassDilutionResult) => massUnitFor(r.take.quantity);
  return {
    compute: (input) => diluteByMass(input, o.to!, o.mass!),
    json: (r) => massDilutionJson(r, rounding),
    columns: ['input', 'target', 'total', 'take_g', 'take', 'diluent_g', 'diluent'],
    cells: (r) => [r.written.stock, r.written.target, r.written.total, decimalCell(r.take.quantity.value), w(r.take, mu(r)), decimalCell(r.diluent.quantity.value), w(r.diluent, massUnitFor(r.diluent.quantity))],
    block: (r) =>
      [
        `by mass: ${r.written.stock} → ${r.written.target}, ${r.written.total} in all (dilution 1:${r.factor.value.toSignificantDigits(6).toFixed()})`,
        `  weigh ${w(r.take, mu(r))} of the ${r.written.stock} material and ${w(r.diluent, massUnitFor(r.diluent.quantity))} of diluent (base or filler), and mix`,
      ].join('\n'),
    notes: (r) => r.notes,
    noteItems: (r) => notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}
