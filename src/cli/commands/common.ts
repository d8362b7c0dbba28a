import { Option, type Command } from 'commander';
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
    .option('--abbreviations', 'read group abbreviations (Me, Et, Ph, Bn, Ac, Boc, Ts, …); Pr, Ac and Ts then mean propyl, acetyl and tosyl');
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

/** The rounding option of commands that round reported values. */
export interface RoundingOptions {
  rounding?: 'half-even' | 'half-up';
}

/**
 * Adds --rounding half-even|half-up (half-even by default).
 *
 * @example
 * withRoundingOption(program.command('composition'))
 */
export function withRoundingOption(cmd: Command): Command {
  return cmd.addOption(new Option('--rounding <rule>', 'how reported values are rounded: half-even (default; ASTM E29, ISO 80000-1) or half-up (a house or pharmacopoeial rule)').choices(['half-even', 'half-up']).default('half-even'));
}
