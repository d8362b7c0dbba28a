/**
 * The QC and assay commands: `titration` (assay by direct or back-titration),
 * `standardise` (a titrant against a primary standard), `sample-basis`
 * (as is ↔ dried / anhydrous / solvent-free, with a specification check) and
 * `replicates` (mean, SD, RSD, confidence interval).
 */
import { displayMeasured } from '../../sigfig/round.js';
import { hillAside } from '../../preparation/species.js';
import type { Command } from 'commander';
import type { Note } from '../../errors/issue.js';
import { fail } from '../../errors/pondus-error.js';
import { QC_CAUTION } from '../../assay/caution.js';
import { replicates, type ReplicateResult } from '../../assay/replicates.js';
import { CONTENT_FOR, readBasis, readResultShare, unusedContents, type SampleBasis, type SampleContent } from '../../assay/sample-basis.js';
import { readLimits, type SpecificationCheck } from '../../assay/specification.js';
import { standardise, type StandardiseResult } from '../../assay/standardise.js';
import { titrationAssay, type TitrationAssayResult } from '../../assay/titration-assay.js';
import { standardiseJson } from '../../assay/standardise-json.js';
import { replicatesJson } from '../../assay/replicates-json.js';
import { sampleBasisJson, titrationJson } from '../../assay/qc-json.js';
import { reportOnBasis, type Reported } from '../../assay/reported-on-basis.js';
import { BENCH_CAUTION } from '../../preparation/caution.js';
import type { Quantity } from '../../sigfig/quantity.js';
import type { RoundingMode } from '../../sigfig/round.js';
import { displayMolarMass } from '../output/display.js';
import type { FormulaOptions, OutputOptions } from './common.js';
import { notesJson, numbered, qtext, reportedIn, type RowPresenter } from './qc-rows.js';
import type { CommandRunner } from './runner.js';
import { declareQc } from './declarations.js';

interface BasisCli {
  loss?: string;
  water?: string;
  solvent?: string;
  limits?: string;
  on?: string;
  rounding?: RoundingMode;
}

const OPTION_OF: Record<keyof SampleContent, string> = { loss: '--loss', water: '--water', solvent: '--solvent' };

/** Which basis to report on: --on, or the one basis the content given implies; unused content is a usage error. */
function chooseBasis(o: BasisCli, from: SampleBasis, flag: '--on' | '--to'): { basis: SampleBasis; inferred: boolean } {
  const given = (['loss', 'water', 'solvent'] as const).filter((k) => o[k] !== undefined);
  let basis: SampleBasis;
  let inferred = false;
  if (o.on !== undefined) basis = readBasis(o.on);
  else if (given.length === 0) basis = from;
  else if (given.length === 1) {
    basis = given[0] === 'loss' ? 'dried' : given[0] === 'water' ? 'anhydrous' : 'solvent-free';
    inferred = true;
  } else throw fail({ code: 'USAGE', message: `${given.map((k) => OPTION_OF[k]).join(' and ')} given: say which basis to report on with ${flag} (dried, anhydrous, solvent-free, anhydrous-solvent-free)` });
  const unused = basis === from ? given : unusedContents(o, from, basis);
  if (unused.length) throw fail({ code: 'USAGE', message: `${unused.map((k) => OPTION_OF[k]).join(' and ')} would be ignored converting from ${from} to ${basis}: leave ${unused.length === 1 ? 'it' : 'them'} out or choose another ${flag}` });
  const lacking = basis === from ? [] : [...new Set([...CONTENT_FOR[from], ...CONTENT_FOR[basis]])].filter((k) => o[k] === undefined);
  if (lacking.length) throw fail({ code: 'USAGE', message: `converting from ${from} to ${basis} needs ${lacking.map((k) => OPTION_OF[k]).join(' and ')} (e.g. ${OPTION_OF[lacking[0]]} '0.50 %')` });
  return { basis, inferred };
}

function validateBasisOptions(o: BasisCli, from: SampleBasis, flag: '--on' | '--to' = '--on'): { basis: SampleBasis; inferred: boolean } {
  const b = chooseBasis(o, from, flag);
  if (o.limits !== undefined) readLimits(o.limits);
  return b;
}

function report(value: Quantity, from: SampleBasis, choice: { basis: SampleBasis; inferred: boolean }, o: BasisCli): Reported {
  return reportOnBasis(value, from, choice.basis, { loss: o.loss, water: o.water, solvent: o.solvent, limits: o.limits, rounding: o.rounding, inferred: choice.inferred });
}

// the figure compared is the result rounded to the limits' last digit, which may have more digits than the result reported
const verdict = (s: SpecificationCheck, basis: SampleBasis) => `specification ${s.limits.low}–${s.limits.high} % on the ${basis} basis: ${s.roundedText} % (the result rounded to the limits' last digit) ${s.complies ? 'complies' : 'does NOT comply'}`;

// --- titration ------------------------------------------------------------------

export interface TitrationCli extends FormulaOptions, BasisCli {
  sample?: string;
  titrant?: string;
  volume?: string;
  blank?: string;
  ratio?: string;
  added?: string;
  reagentRatio?: string;
  back?: boolean;
}

type Titration = { t: TitrationAssayResult; rep: Reported };

/** The presenter for `pondus titration`. */
export function titrationPresenter(o: TitrationCli): RowPresenter<Titration> {
  const missing = (['sample', 'titrant', 'volume'] as const).filter((k) => o[k] === undefined);
  if (missing.length) throw fail({ code: 'USAGE', message: `give ${missing.map((k) => `--${k}`).join(', ')}: pondus titration KHC8H4O4 --sample '0.5000 g' --titrant '0.1000 M' --volume '24.40 mL'` });
  if (o.reagentRatio !== undefined && o.added === undefined && !o.back) throw fail({ code: 'USAGE', message: '--reagent-ratio belongs to a back-titration: give --added or --back too' });
  if (o.back && o.added === undefined && o.blank === undefined) throw fail({ code: 'USAGE', message: 'a back-titration needs --added (the excess reagent) or --blank (the titre of the reagent alone)' });
  const rounding = o.rounding ?? 'half-even';
  const choice = validateBasisOptions(o, 'as-is');
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations, sample: o.sample!, titrant: o.titrant!, volume: o.volume!, blank: o.blank, ratio: o.ratio, added: o.added, reagentRatio: o.reagentRatio, back: o.back };
  const allNotes = (x: Titration) => [...x.t.notes, ...x.rep.notes];
  const pct = (q: Quantity) => qtext(q, '%', rounding);
  return {
    compute: numbered((input) => {
      const t = titrationAssay(input, opts);
      return { t, rep: report(t.assay, 'as-is', choice, o) };
    }),
    json: ({ input, r: { t, rep } }) => titrationJson(t, rep, input, rounding),
    columns: ['input', 'line', 'analyte', 'kind', 'ratio', 'moles_mmol', 'assay_percent', 'assay_reported', 'basis', 'reported_percent', 'reported', 'limits', 'complies'],
    cells: ({ input, line, r }) => {
      const a = reportedIn(r.t.assay, '%', rounding);
      const b = reportedIn(r.rep.value, '%', rounding);
      return [input, line, r.t.analyte.formula, r.t.kind, r.t.ratio.text, reportedIn(r.t.moles, 'mmol', rounding).value, a.value, a.reported, r.rep.basis, b.value, b.reported, r.rep.spec ? `${r.rep.spec.limits.low}-${r.rep.spec.limits.high}` : '', r.rep.spec ? (r.rep.spec.complies ? 'yes' : 'no') : ''];
    },
    block: ({ input, r: { t, rep } }) => {
      const lines = [`${input}  (${hillAside(t.analyte)}M = ${displayMolarMass(t.analyte)} g/mol), ${t.kind === 'back' ? 'back-titration' : 'direct titration'}`];
      if (t.kind === 'direct') {
        lines.push(`  ${qtext(t.titrant, 'M', rounding)} × ${qtext(t.netTitre, 'mL', rounding)}${t.blank ? ` (titre ${qtext(t.titre, 'mL', rounding)} − blank ${qtext(t.blank, 'mL', rounding)})` : ''} × ${t.ratio.text} = ${qtext(t.moles, 'mmol', rounding)} of ${input}`);
      } else if (t.added) {
        lines.push(`  reagent added ${qtext(t.added, 'mmol', rounding)}; left ${qtext(t.titrant, 'M', rounding)} × ${qtext(t.titre, 'mL', rounding)} × ${t.reagentRatio!.text}; ${input} = reacted × ${t.ratio.text} = ${qtext(t.moles, 'mmol', rounding)}`);
      } else {
        lines.push(`  ${qtext(t.titrant, 'M', rounding)} × (blank ${qtext(t.blank!, 'mL', rounding)} − titre ${qtext(t.titre, 'mL', rounding)}) × ${t.reagentRatio!.text} × ${t.ratio.text} = ${qtext(t.moles, 'mmol', rounding)} of ${input}`);
      }
      lines.push(`  ${qtext(t.mass, t.mass.value.gte(1) ? 'g' : 'mg', rounding)} in ${qtext(t.sample, 'g', rounding)} of sample: assay ${pct(t.assay)} (as is)`);
      if (rep.conversion) lines.push(`  on the ${rep.basis} basis: ${pct(rep.value)}`);
      if (rep.spec) lines.push(`  ${verdict(rep.spec, rep.basis)}`);
      return lines.join('\n');
    },
    notes: ({ r }) => allNotes(r),
    noteItems: ({ r }) => notesJson(allNotes(r)),
    caution: QC_CAUTION,
  };
}

// --- standardise ------------------------------------------------------------------

export interface StandardiseCli extends FormulaOptions {
  mass?: string;
  volume?: string;
  blank?: string;
  ratio?: string;
  purity?: string;
  rounding?: RoundingMode;
}

/** The presenter for `pondus standardise`. */
export function standardisePresenter(o: StandardiseCli): RowPresenter<StandardiseResult> {
  const missing = (['mass', 'volume'] as const).filter((k) => o[k] === undefined);
  if (missing.length) throw fail({ code: 'USAGE', message: `give ${missing.map((k) => `--${k}`).join(' and ')}: pondus standardise KHC8H4O4 --mass '0.5105 g' --volume '24.95 mL'` });
  const rounding = o.rounding ?? 'half-even';
  const opts = { weights: o.weights ?? 'standard', abbreviations: !!o.abbreviations, mass: o.mass!, volume: o.volume!, blank: o.blank, ratio: o.ratio, purity: o.purity };
  return {
    compute: numbered((input) => standardise(input, opts)),
    json: ({ input, r }) => standardiseJson(r, input, rounding),
    columns: ['input', 'line', 'standard', 'ratio', 'moles_mmol', 'molarity_M', 'molarity'],
    cells: ({ input, line, r }) => {
      const m = reportedIn(r.molarity, 'M', rounding);
      return [input, line, r.standard.formula, r.ratio.text, reportedIn(r.moles, 'mmol', rounding).value, m.value, m.reported];
    },
    block: ({ input, r }) =>
      [
        `${input}  (${hillAside(r.standard)}M = ${displayMolarMass(r.standard)} g/mol) as primary standard`,
        `  ${qtext(r.mass, 'g', rounding)}${r.purity ? ` × ${qtext(r.purity, '%', rounding)}` : ''} ÷ M = ${qtext(r.moles, 'mmol', rounding)} of standard; mol titrant = mol standard × ${r.ratio.second}/${r.ratio.first}`,
        `  titre ${qtext(r.netTitre, 'mL', rounding)}${r.blank ? ` (blank ${qtext(r.blank, 'mL', rounding)} subtracted)` : ''}: titrant molarity ${qtext(r.molarity, 'M', rounding)}`,
      ].join('\n'),
    notes: ({ r }) => r.notes,
    noteItems: ({ r }) => notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}

// --- sample-basis -----------------------------------------------------------------

export interface SampleBasisCli extends OutputOptions, BasisCli {
  from?: string;
  to?: string;
}

type BasisRow = { rep: Reported; value: Quantity; from: SampleBasis; notes: Note[] };

/** The presenter for `pondus sample-basis`. */
export function sampleBasisPresenter(o: SampleBasisCli): RowPresenter<BasisRow> {
  const rounding = o.rounding ?? 'half-even';
  const from = o.from === undefined ? 'as-is' : readBasis(o.from);
  const to = o.to ?? o.on;
  if (to === undefined && o.limits === undefined) throw fail({ code: 'USAGE', message: "give --to (dried, anhydrous, solvent-free, anhydrous-solvent-free, as-is) and the content it needs, e.g. --to dried --loss '0.50 %'" });
  if (to !== undefined && readBasis(to) === from && o.limits === undefined) throw fail({ code: 'USAGE', message: `the result is already on the ${from} basis: choose another --to` });
  const choice = validateBasisOptions({ ...o, on: to }, from, '--to');
  if (choice.basis === from && o.limits === undefined) throw fail({ code: 'USAGE', message: `the result is already on the ${from} basis: choose another --to` });
  return {
    compute: numbered((input) => {
      const notes: Note[] = [];
      if (o.from === undefined) notes.push({ code: 'FROM_AS_IS', message: 'the result is taken as on the as-is basis; give --from otherwise' });
      const value = readResultShare(input, notes);
      const rep = report(value, from, choice, o);
      return { rep, value, from, notes };
    }),
    json: ({ input, r }) => sampleBasisJson(r.value, r.from, r.rep, r.notes, input, rounding),
    columns: ['input', 'line', 'from', 'to', 'converted_percent', 'converted', 'limits', 'complies'],
    cells: ({ input, line, r }) => {
      const c = reportedIn(r.rep.value, '%', rounding);
      return [input, line, r.from, r.rep.basis, c.value, c.reported, r.rep.spec ? `${r.rep.spec.limits.low}-${r.rep.spec.limits.high}` : '', r.rep.spec ? (r.rep.spec.complies ? 'yes' : 'no') : ''];
    },
    block: ({ input, r }) => {
      const lines = [`${input} (${r.from})${r.rep.conversion ? ` → ${qtext(r.rep.value, '%', rounding)} on the ${r.rep.basis} basis` : ''}`];
      if (r.rep.spec) lines.push(`  ${verdict(r.rep.spec, r.rep.basis)}`);
      return lines.join('\n');
    },
    notes: ({ r }) => [...r.notes, ...r.rep.notes],
    noteItems: ({ r }) => notesJson([...r.notes, ...r.rep.notes]),
    caution: QC_CAUTION,
  };
}

// --- replicates -----------------------------------------------------------------

export interface ReplicatesCli extends OutputOptions {
  level?: string;
  rounding?: RoundingMode;
}

/** The presenter for `pondus replicates`. */
export function replicatesPresenter(o: ReplicatesCli): RowPresenter<ReplicateResult> {
  const rounding = o.rounding ?? 'half-even';
  const level = o.level === undefined ? 95 : Number(o.level.replace(/\s*%$/, ''));
  if (!(level >= 50 && level <= 99.9)) throw fail({ code: 'USAGE', message: `--level is a confidence level in percent between 50 and 99.9 (90, 95, 99); got '${o.level}'` });
  const fig2 = (d: { toSignificantDigits(n: number): { toFixed(): string } }) => d.toSignificantDigits(2).toFixed();
  return {
    compute: numbered((input) => replicates(input, { level, rounding })),
    json: ({ input, r }) => replicatesJson(r, input),
    columns: ['input', 'line', 'n', 'mean', 'sd', 'rsd_percent', 'level', 't', 'half_width', 'reported'],
    cells: ({ input, line, r }) => [input, line, r.n, r.mean.value.toNumber(), r.sd.toNumber(), r.rsdPercent.toNumber(), r.level, r.t, r.halfWidth.toNumber(), r.reported],
    block: ({ input, r }) => {
      const u = r.unit ? ` ${r.unit}` : '';
      return [
        `${input}`,
        `  n = ${r.n}; mean ${displayMeasured(r.mean, r.rounding).text}${u}; s = ${fig2(r.sd)}${u}; RSD = ${fig2(r.rsdPercent)} %`,
        `  ${r.level} % confidence interval (t = ${r.t.toFixed(3)}, ${r.df} df): ${r.reported}`,
      ].join('\n');
    },
    notes: ({ r }) => r.notes,
    noteItems: ({ r }) => notesJson(r.notes),
  };
}

// --- registration -----------------------------------------------------------------

/** Registers `titration`, `standardise`, `sample-basis` and `replicates`. */
export function registerQc(program: Command, run: CommandRunner, only?: string): void {
  const c = declareQc(program, only);
  c.titration?.action((inputs: string[], o: TitrationCli) => run('titration', inputs, o));
  c.standardise?.action((inputs: string[], o: StandardiseCli) => run('standardise', inputs, o));
  c.sampleBasis?.action((inputs: string[], o: SampleBasisCli) => run('sample-basis', inputs, o));
  c.replicates?.action((inputs: string[], o: ReplicatesCli) => run('replicates', inputs, o));
}

/** Presenters of the QC commands, by name. */
export const QC_PRESENTERS = {
  titration: (o: TitrationCli) => (titrationPresenter(o)),
  standardise: (o: StandardiseCli) => (standardisePresenter(o)),
  'sample-basis': (o: SampleBasisCli) => (sampleBasisPresenter(o)),
  replicates: (o: ReplicatesCli) => (replicatesPresenter(o)),
};
