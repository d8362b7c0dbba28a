import type { Command } from 'commander';
import { fail } from '../../errors/pondus-error.js';
import { BENCH_CAUTION } from '../../preparation/caution.js';
import { prepareSolution, type SolutionResult } from '../../preparation/solution.js';
import { substituteForm, type SubstituteResult } from '../../preparation/substitute.js';
import { displayQuantity } from '../../sigfig/display-quantity.js';
import { displayMolarMass } from '../output/display.js';
import type { Presenter } from '../output/presenter.js';
import { withOutputOptions, type OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';

interface PrepareCliOptions extends OutputOptions {
  concentration?: string;
  volume?: string;
  purity?: string;
  as?: string;
  replace?: string;
  abbreviations?: boolean;
}

type Prepared = { kind: 'solution'; r: SolutionResult } | { kind: 'substitute'; r: SubstituteResult };

const fig = (q: Parameters<typeof displayQuantity>[0], unit?: string) => displayQuantity(q, unit).text;

/** The presenter for `pondus prepare`. */
export function preparePresenter(o: PrepareCliOptions): Presenter<Prepared> {
  const options = { abbreviations: !!o.abbreviations };
  const compute = (input: string): Prepared => {
    if (o.replace !== undefined) {
      const eq = o.replace.indexOf('=');
      if (eq <= 0) throw fail({ code: 'USAGE', message: "--replace takes FORM=AMOUNT, e.g. --replace 'CuSO4=10.00 g'" });
      return { kind: 'substitute', r: substituteForm(input, o.replace.slice(0, eq).trim(), o.replace.slice(eq + 1), options) };
    }
    if (o.concentration === undefined || o.volume === undefined) throw fail({ code: 'USAGE', message: "give --concentration and --volume (e.g. --concentration '0.100 M' --volume '250.0 mL'), or --replace FORM=AMOUNT" });
    return { kind: 'solution', r: prepareSolution(input, { ...options, concentration: o.concentration, volume: o.volume, purity: o.purity, as: o.as }) };
  };
  return {
    compute,
    json: (p) =>
      p.kind === 'solution'
        ? {
            input: p.r.reagent.input,
            formula: p.r.reagent.formula,
            molarMass: p.r.reagent.molarMass.toNumber(),
            concentration: fig(p.r.concentration, p.r.concentration.unit?.symbol),
            volume: fig(p.r.volume, p.r.volume.unit?.symbol),
            purity: p.r.purity ? displayQuantity(p.r.purity, '%').text : null,
            moles: displayQuantity(p.r.moles, 'mol').value.toNumber(),
            mass: displayQuantity(p.r.mass, 'g').value.toNumber(),
            display: fig(p.r.mass, 'g'),
            notes: p.r.notes.map((n) => n.message),
            caution: BENCH_CAUTION,
          }
        : {
            input: p.r.use.input,
            formula: p.r.use.formula,
            instead: p.r.instead.formula,
            moles: displayQuantity(p.r.moles, 'mol').value.toNumber(),
            mass: displayQuantity(p.r.mass, 'g').value.toNumber(),
            display: fig(p.r.mass, 'g'),
            notes: p.r.notes.map((n) => n.message),
            caution: BENCH_CAUTION,
          },
    columns: ['input', 'formula', 'mass', 'display'],
    cells: (p) => (p.kind === 'solution' ? [p.r.reagent.input, p.r.reagent.formula, displayQuantity(p.r.mass, 'g').value.toFixed(), fig(p.r.mass, 'g')] : [p.r.use.input, p.r.use.formula, displayQuantity(p.r.mass, 'g').value.toFixed(), fig(p.r.mass, 'g')]),
    block: (p) => {
      if (p.kind === 'substitute') {
        const r = p.r;
        return [
          `use ${r.use.input} (M = ${displayMolarMass(r.use)} g/mol) instead of ${r.instead.input} (M = ${displayMolarMass(r.instead)} g/mol):`,
          `  ${fig(r.asked, r.asked.unit?.symbol)} of ${r.instead.input} = ${fig(r.moles, 'mol')}`,
          `  weigh ${fig(r.mass, 'g')} of ${r.use.input}`,
        ].join('\n');
      }
      const r = p.r;
      const lines = [`${r.reagent.input}  (${r.reagent.formula}, M = ${displayMolarMass(r.reagent)} g/mol)`];
      lines.push(`  target: ${fig(r.concentration, r.concentration.unit?.symbol)}${r.target.formula !== r.reagent.formula ? ` of ${r.target.formula} (${r.target.perReagent} per formula unit)` : ''} in ${fig(r.volume, r.volume.unit?.symbol)}`);
      lines.push(`  amount of ${r.reagent.input}: ${fig(r.moles, 'mol')}; pure mass ${fig(r.pureMass, 'g')}`);
      if (r.purity) lines.push(`  assay ${displayQuantity(r.purity, '%').text}: ${fig(r.pureMass, 'g')} ÷ ${displayQuantity(r.purity, '%').text}`);
      lines.push(`  weigh ${fig(r.mass, 'g')} of ${r.reagent.input}, dissolve, and make up to ${fig(r.volume, r.volume.unit?.symbol)}`);
      return lines.join('\n');
    },
    notes: (p) => p.r.notes.map((n) => n.message),
    caution: BENCH_CAUTION,
  };
}

/** Registers `pondus prepare`. */
export function registerPrepare(program: Command, run: CommandRunner): void {
  withOutputOptions(
    program
      .command('prepare')
      .description('mass of a reagent to weigh for a solution (with assay and hydrate form), or to replace another form')
      .argument('[reagents...]', 'the reagent as it is in the bottle, e.g. CuSO4·5H2O; - reads one per line')
      .option('--concentration <c>', "target concentration: '0.100 M', '5.00 g/L', '1000 ppm' (mg/L), '2.0 %' (w/v)")
      .option('--volume <v>', "final volume: '250.0 mL'")
      .option('--purity <p>', "the reagent's assay: '98.5 %'")
      .option('--as <species>', 'the concentration is of this part of the reagent: Cu, Cl, CuSO4, …')
      .option('--replace <form=amount>', "weigh this reagent in place of another form: --replace 'CuSO4=10.00 g'")
      .option('--abbreviations', 'read group abbreviations in formulas'),
  ).action((inputs: string[], o: PrepareCliOptions) => run('prepare', inputs, o));
}
