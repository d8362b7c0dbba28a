import { writeFileSync } from 'node:fs';
import type { Command } from 'commander';
import { fail } from '../../errors/pondus-error.js';
import { readIonLine } from '../../ions/read-ion-line.js';
import { isotopePattern, type PatternResult } from '../../isotope-pattern/pattern.js';
import { patternJson } from '../../isotope-pattern/pattern-json.js';
import { patternSvg } from '../../isotope-pattern/pattern-svg.js';
import { stickPlot } from '../../isotope-pattern/stick-plot.js';
import type { Presenter } from '../output/presenter.js';
import { styleFor } from '../output/style.js';
import type { OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { Decimal } from '../../exact/decimal.js';

export interface PatternCliOptions extends OutputOptions {
  adduct?: string;
  fine?: boolean;
  resolution?: string;
  coverage?: string;
  minRelative?: string;
  svg?: string;
  abbreviations?: boolean;
}

/** Peaks given their own CSV columns (mz1, relative1, …), the largest ones, by m/z. */
const CSV_PEAKS = 12;

function positive(text: string | undefined, name: string, max: number): number | undefined {
  if (text === undefined) return undefined;
  const t = text.trim().replace(/[kK]$/, '000');
  const n = /^[0-9]+(\.[0-9]+)?$/.test(t) ? Number(t) : NaN;
  if (!(n > 0 && n <= max)) throw fail({ code: 'USAGE', message: `--${name} takes a positive number up to ${max}, not '${text}'` });
  return n;
}

/**
 * The presenter for `pondus pattern`.
 *
 * @example
 * patternPresenter({ resolution: '60000' }).compute('C15H15NO2 [M+H]+').kind // 'fine'
 */
export function patternPresenter(o: PatternCliOptions): Presenter<PatternResult> {
  const resolvingPower = positive(o.resolution, 'resolution', 1e8);
  const coveragePercent = positive(o.coverage, 'coverage', 100);
  const minRelative = o.minRelative === undefined ? 0.1 : Number(o.minRelative);
  if (!(minRelative >= 0 && minRelative < 100)) throw fail({ code: 'USAGE', message: `--min-relative takes a percentage from 0 to 100, not '${o.minRelative}'` });
  if (coveragePercent !== undefined && !o.fine && resolvingPower === undefined) throw fail({ code: 'USAGE', message: '--coverage applies to the fine structure: add --fine or --resolution' });
  const opts = {
    ion: o.adduct,
    kind: o.fine || resolvingPower !== undefined ? ('fine' as const) : ('aggregated' as const),
    resolvingPower,
    coverage: coveragePercent === undefined ? undefined : coveragePercent / 100,
    minRelative,
    abbreviations: !!o.abbreviations,
  };
  const paint = styleFor(process.stdout).cyan;
  // the input as given (a line with its ion), for the JSON and CSV rows
  const raw = new WeakMap<PatternResult, string>();
  const describe = (r: PatternResult) =>
    r.kind === 'aggregated'
      ? 'aggregated pattern: one peak per nominal mass, at its centroid'
      : r.resolvingPower !== null
        ? `fine structure at resolving power ${r.resolvingPower.toLocaleString('en-US')} (peaks closer than FWHM = m/R merged), ${(r.coverage * 100).toFixed(2)} % of the probability`
        : `fine structure, every isotopologue apart, ${(r.coverage * 100).toFixed(2)} % of the probability`;
  const csvPeaks = (r: PatternResult) => {
    const top = [...r.peaks].sort((a, b) => b.abundance - a.abundance).slice(0, CSV_PEAKS).sort((a, b) => a.mz - b.mz);
    const cells: (string | number)[] = [];
    for (let i = 0; i < CSV_PEAKS; i++) cells.push(top[i] ? top[i].mz : '', top[i] ? Number(top[i].relative.toFixed(4)) : '');
    return cells;
  };
  const peakColumns: string[] = [];
  for (let i = 1; i <= CSV_PEAKS; i++) peakColumns.push(`mz${i}`, `relative${i}`);
  return {
    compute: (input) => {
      const line = readIonLine(input);
      if (line.found !== null) throw fail({ code: 'BAD_OPTION', message: `a pattern takes a formula and optionally an ion, not a found m/z ('${line.found}')` }, input);
      if (line.ion !== null && o.adduct !== undefined) throw fail({ code: 'ION_CONFLICT', message: `the input names the ion ${line.ion} and --adduct gives ${o.adduct}: give one of them` }, input);
      const r = isotopePattern(line.formula, { ...opts, ion: line.ion ?? o.adduct });
      raw.set(r, input);
      if (o.svg !== undefined) {
        try {
          writeFileSync(o.svg, patternSvg(r));
        } catch (e) {
          throw fail({ code: 'USAGE', message: `cannot write ${o.svg}: ${(e as NodeJS.ErrnoException).code ?? String(e)}` });
        }
        r.notes.push({ code: 'SVG_WRITTEN', message: `picture written to ${o.svg}` });
      }
      return r;
    },
    json: (r) => Object.assign(patternJson(r), { input: raw.get(r) ?? r.input }),
    columns: ['input', 'formula', 'ion', 'speciesFormula', 'charge', 'kind', 'resolvingPower', 'coverage', 'monoisotopicMz', 'averageMz', ...peakColumns],
    cells: (r) => [raw.get(r) ?? r.input, r.formula, r.ion ?? '', r.speciesFormula, r.charge, r.kind, r.resolvingPower ?? '', r.coverage, new Decimal(r.monoisotopicMzExact).toDecimalPlaces(12).toFixed(), r.averageMz, ...csvPeaks(r)],
    block: (r) => {
      const head = `${r.ion ? `${r.ion} of ${r.formula}: ` : ''}${r.speciesFormula}   monoisotopic ${r.charge !== 0 ? 'm/z' : 'mass'} ${new Decimal(r.monoisotopicMzExact).toFixed(4)}, average ${r.averageMz.toFixed(4)}`;
      return [head, `${describe(r)}; peaks of at least ${r.minRelative} % of the largest`, ...stickPlot(r.peaks, { paint })].join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => r.notes,
  };
}

/**
 * Attaches the action of `pondus pattern` to its declared command (commands/declarations.ts).
 *
 * @example
 * attachPattern(declareIon(program).pattern, run)
 */
export function attachPattern(cmd: Command, run: CommandRunner): void {
  cmd.action((inputs: string[], o: PatternCliOptions) => {
    if (o.svg !== undefined && (inputs.length !== 1 || inputs[0] === '-')) throw fail({ code: 'USAGE', message: '--svg draws one pattern: give one input' });
    return run('pattern', inputs, o);
  });
}
