import { Option, type Command } from 'commander';
import type { RoundingMode } from '../../sigfig/round.js';
import type { WeightTable } from '../../elements/atom-data.js';
import { fail } from '../../errors/pondus-error.js';
import type { OutputFormat } from '../output/format.js';

/** Options every command shares. */
export interface OutputOptions {
  json?: boolean;
  csv?: boolean;
  tsv?: boolean;
}

/** Options of commands that read formulas. */
export interface FormulaOptions extends OutputOptions {
  weights?: WeightTable;
  abbreviations?: boolean;
}

/** Adds --json, --csv and --tsv. */
export function withOutputOptions(cmd: Command): Command {
  return cmd
    .option('--json', 'JSON Lines: one object per input, in input order')
    .option('--csv', 'CSV: a header, then one row per input')
    .option('--tsv', 'tab-separated: a header, then one row per input');
}

/** Adds the options of commands that read formulas. */
export function withFormulaOptions(cmd: Command): Command {
  return withOutputOptions(cmd)
    .addOption(new Option('--weights <table>', 'atomic weights: standard (CIAAW 2021 + 2024 revisions) or abridged (five figures)').choices(['standard', 'abridged']).default('standard'))
    .option('--abbreviations', 'also read the abbreviations that need the reading settled: Ac (acetyl, OAc), Pr (propyl), Ts (tosyl) and reagent names such as THF, COD, TBS (Me, Et, Ph, Boc, Cp*, py and the like are read by default)');
}

/**
 * The output format chosen; more than one is a usage error.
 *
 * @example
 * outputFormat({ json: true }) // 'json'
 */
export function outputFormat(o: OutputOptions): OutputFormat {
  const chosen = (['json', 'csv', 'tsv'] as const).filter((k) => o[k]);
  if (chosen.length > 1) throw fail({ code: 'USAGE', message: `choose one output format, not ${chosen.map((c) => `--${c}`).join(' and ')}` });
  return chosen[0] ?? 'table';
}

/** Options of commands that round what they report. */
export interface RoundingOptions {
  rounding?: RoundingMode;
}

/**
 * Adds `--rounding half-even|half-up` (half-even when not given: ASTM E29, ISO 80000-1 Annex B rule A).
 * The default is applied by {@link roundingOf}, not by commander, so a repeated option can be told apart.
 *
 * @example
 * withRoundingOption(program.command('prepare'))
 */
export function withRoundingOption(cmd: Command): Command {
  return cmd.addOption(new Option('--rounding <mode>', 'rounding of reported figures: half-even (default; ASTM E29, ISO 80000-1) or half-up (a pharmacopoeia or house rule)').choices(['half-even', 'half-up']));
}

/**
 * The rounding chosen, half-even by default.
 *
 * @example
 * roundingOf({}) // 'half-even'
 */
export function roundingOf(o: RoundingOptions): RoundingMode {
  return o.rounding ?? 'half-even';
}

/**
 * Makes every option of a command that takes one value refuse to be given twice
 * (`dilute --to A --to B` would otherwise silently use B): a usage error
 * (exit status 2) naming the option. Options listed in `repeatable` (those
 * that collect values, such as `react --amount`) are left alone. Call it after
 * all options are added.
 *
 * @example
 * refuseRepeatedOptions(program.command('dilute').option('--to <c>'), [])
 */
export function refuseRepeatedOptions(cmd: Command, repeatable: string[] = []): Command {
  for (const opt of cmd.options) {
    if (!(opt.required || opt.optional) || opt.variadic || (opt.long && repeatable.includes(opt.long))) continue;
    const inner = opt.parseArg;
    const key = opt.attributeName();
    const flag = opt.long ?? opt.short ?? opt.flags;
    opt.argParser((value: string, previous: unknown) => {
      if (cmd.getOptionValueSource(key) === 'cli') {
        throw fail({ code: 'USAGE', message: `${flag} is given twice ('${String(previous)}' and '${value}'): it takes one value, give it once` });
      }
      return inner ? inner(value, previous) : value;
    });
  }
  return cmd;
}

/**
 * A usage error (exit status 2) for options that cannot go together.
 *
 * @example
 * throw conflict('--replace', ['--concentration', '--volume'], 'the amount replaced sets the mass')
 */
export function conflict(option: string, others: string[], why: string) {
  return fail({ code: 'USAGE', message: `${option} cannot be combined with ${others.join(' or ')}: ${why}` });
}

/**
 * The options among `names` that were given.
 *
 * @example
 * given({ volume: '1 L' }, { volume: '--volume', as: '--as' }) // ['--volume']
 */
export function given(o: object, names: Record<string, string>): string[] {
  return Object.entries(names)
    .filter(([k]) => (o as Record<string, unknown>)[k] !== undefined && (o as Record<string, unknown>)[k] !== false)
    .map(([, flag]) => flag);
}
