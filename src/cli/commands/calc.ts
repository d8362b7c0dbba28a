import type { Command } from 'commander';
import { calc, calcJson, calcJsonLine, type CalcResult } from '../../calc/calc.js';
import type { RoundingMode } from '../../sigfig/round.js';
import type { Presenter } from '../output/presenter.js';
import { decimalCell } from '../output/format.js';
import { roundingOf, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { declareCalc } from './declarations.js';

interface CalcCliOptions extends OutputOptions, RoundingOptions {
  explain?: boolean;
}

/** The presenter for `pondus calc`. */
export function calcPresenter(o: CalcCliOptions): Presenter<CalcResult> {
  // the steps are shown only with --explain: without it they are not written down
  const opts: { rounding: RoundingMode; steps: boolean } = { rounding: roundingOf(o), steps: !!o.explain };
  return {
    compute: (input) => calc(input, opts),
    json: (r) => (o.explain ? { ...calcJson(r), steps: r.steps, rounding: opts.rounding } : calcJson(r)),
    ...(o.explain ? {} : { jsonLine: (r: CalcResult) => calcJsonLine(r), jsonRow: (input: string, line: number) => calcJsonLine(calc(input, opts), line) }),
    columns: ['input', 'value', 'display', 'sigFigs', 'unit', 'uncertainty'],
    cells: (r) => [r.input, decimalCell(r.value), r.display, r.sigFigs, r.unit, r.uncertainty ? decimalCell(r.uncertainty) : ''],
    block: (r) => {
      const sf = r.sigFigs === null ? (r.uncertainty ? 'standard uncertainty, k = 1' : 'exact') : `${r.sigFigs} significant figure${r.sigFigs === 1 ? '' : 's'}`;
      const lines = [`${r.input}  =  ${r.display}   (${sf})`];
      if (o.explain) {
        r.steps.forEach((s, i) => lines.push(`  ${i + 1}. ${s.text}: ${s.rule}`));
        if (r.steps.length === 0) lines.push('  a single value: its precision is as written');
        lines.push(`  unrounded: ${r.value.toFixed()} ${r.unit}`.trimEnd() + `; rounded once, ${opts.rounding === 'half-up' ? 'half up' : 'half to even'}`);
      }
      return lines.join('\n');
    },
    notes: (r) => r.notes,
    noteItems: (r) => r.notes,
  };
}

/** Registers `pondus calc`. */
export function registerCalc(program: Command, run: CommandRunner): void {
  declareCalc(program).action((inputs: string[], o: CalcCliOptions) => run('calc', inputs, o));
}
