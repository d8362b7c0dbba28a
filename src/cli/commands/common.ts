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
 * Refuses `--rounding` where it would be ignored: a command whose JSON and CSV carry every digit,
 * with no figure rounded for display (mass, composition of a formula).
 *
 * @example
 * refuseUnusedRounding({ json: true }) // no refusal without --rounding
 */
export function refuseUnusedRounding(o: RoundingOptions & OutputOptions): void {
  if (o.rounding !== undefined && (o.json || o.csv || o.tsv)) {
    throw fail({ code: 'USAGE', message: `--rounding sets how the table rounds its figures; ${o.json ? '--json' : o.csv ? '--csv' : '--tsv'} carries every digit, unrounded: drop --rounding, or the format for the table` });
  }
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

/** What a command's usage errors say, by option: the reason each conflict is one, the hint for each required option. */
interface UsageRules {
  conflicts: Map<string, { others: string[]; why: string }[]>;
  required: Map<string, string>;
}
const RULES = new WeakMap<Command, UsageRules>();

function rulesOf(cmd: Command): UsageRules {
  let r = RULES.get(cmd);
  if (!r) RULES.set(cmd, (r = { conflicts: new Map(), required: new Map() }));
  return r;
}

function optionOf(cmd: Command, flag: string): Option {
  const opt = cmd.options.find((o) => o.long === flag);
  if (!opt) throw new Error(`${cmd.name()} has no option ${flag}`);
  return opt;
}

/**
 * Declares that an option cannot go with others: commander refuses the pair (exit status 2) before
 * the command runs, and the message says why, in pondus's words (`--a cannot be combined with --b
 * or --c: why`). Only options given on the command line count, not defaults.
 *
 * @example
 * conflicting(cmd, '--explain', ['--csv', '--tsv'], 'the steps are shown in the table')
 */
export function conflicting(cmd: Command, flag: string, others: string[], why: string): Command {
  optionOf(cmd, flag).conflicts(others.map((o) => optionOf(cmd, o).attributeName()));
  const rules = rulesOf(cmd).conflicts;
  rules.set(flag, [...(rules.get(flag) ?? []), { others, why }]);
  return cmd;
}

/**
 * Makes an option required: commander refuses the command without it (exit status 2), and the
 * message is the hint given (`give the weighed form: --weighed Fe2O3`).
 *
 * @example
 * required(cmd, '--weighed', 'give the weighed form: --weighed Fe2O3')
 */
export function required(cmd: Command, flag: string, hint: string): Command {
  optionOf(cmd, flag).makeOptionMandatory(true);
  rulesOf(cmd).required.set(flag, hint);
  return cmd;
}

/**
 * Commander's own usage message for a command, in pondus's words where the command declared them
 * (a conflict's reason, a required option's hint); any other message as commander wrote it.
 *
 * @example
 * usageMessage(cmd, "error: required option '--weighed <form>' not specified") // 'error: give the weighed form: --weighed Fe2O3'
 */
export function usageMessage(cmd: Command, message: string): string {
  // a negative number looks like an option to the shell's reader: '--' before it says it is an input
  const negative = /^error: unknown option '(-[0-9.][^']*)'/.exec(message);
  if (negative) return `error: '${negative[1]}' starts with a minus sign and is read as an option; put -- after the options and before all the inputs: pondus ${cmd.name()} [options] -- … '${negative[1]}'`;
  const rules = RULES.get(cmd);
  if (!rules) return message;
  const conflict = /^error: option '(?:-\w, )?(--[a-z0-9-]+)[^']*' cannot be used with option '(?:-\w, )?(--[a-z0-9-]+)/.exec(message);
  const rule = conflict && rules.conflicts.get(conflict[1])?.find((r) => r.others.includes(conflict[2]));
  if (rule) return `error: ${conflict[1]} cannot be combined with ${rule.others.join(' or ')}: ${rule.why}`;
  const missing = /^error: required option '(?:-\w, )?(--[a-z0-9-]+)/.exec(message);
  const hint = missing && rules.required.get(missing[1]);
  if (hint) return `error: ${hint}`;
  return message;
}

/**
 * Sends a command's usage errors through {@link usageMessage} (call once every option is declared).
 *
 * @example
 * withUsageMessages(program.command('gravimetric'))
 */
export function withUsageMessages(cmd: Command): Command {
  const error = cmd.error.bind(cmd);
  cmd.error = (message, errorOptions) => error(usageMessage(cmd, message), errorOptions);
  return cmd;
}
