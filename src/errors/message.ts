/**
 * The one place the words of issues and notes are made: {@link messageFor} renders the message of
 * a typed issue from its machine fields, and it, {@link hintFor} and {@link noteText} name the
 * options and functions they mention the way the reader calls them (the library by option and
 * function name, the command line by flag and command). It knows nothing of any flag itself.
 */
import { hasFields, type Issue, type IssueFields, type LibraryFunction, type TypedCode, type TypedIssue } from './issue.js';

/**
 * How the options and functions an issue or note mentions are named. The library names an option
 * as its options object does, in backquotes (`` `abbreviations: true` ``, `` `density` ``), and a
 * function by its name (`` `diluteByMass` ``); the command line passes its own naming, which turns
 * the same into its flag and its command.
 */
export interface OptionNaming {
  /** The words for option `name`, given with `value` (or none) in the text. */
  option(name: string, value: string | undefined): string;
  /** The words for the library function `name` (on the command line, the command that runs it). */
  command(name: LibraryFunction): string;
}

/** The library's own naming: the option as its options object spells it, and the function, in backquotes. */
export const LIBRARY_NAMING: OptionNaming = {
  option: (name, value) => (value === undefined ? `\`${name}\`` : `\`${name}: ${value}\``),
  command: (name) => `\`${name}\``,
};

/** What names options and functions in its text: an issue or a note. */
interface Named {
  options?: readonly string[];
  functions?: readonly LibraryFunction[];
}

/** The naming notes are worded in when they are written out; the library's own but within {@link withNaming}. */
let notesNaming: OptionNaming = LIBRARY_NAMING;

/**
 * Runs `run` with the notes written out in `naming`: {@link noteText} and the serialisers' notes
 * (`notesJson`) name options and functions so until `run` returns. A result keeps the library's
 * words in its notes; the command line writes its output within `withNaming(FLAG_NAMING, …)`, so
 * that its text, JSON and CSV show flags.
 *
 * @example
 * withNaming({ option: (n) => `--${n}`, command: (f) => f }, () => noteText({ message: 'give `density`', options: ['density'] })) // 'give --density'
 */
export function withNaming<T>(naming: OptionNaming, run: () => T): T {
  const was = notesNaming;
  notesNaming = naming;
  try {
    return run();
  } finally {
    notesNaming = was;
  }
}

/**
 * A note's words with the options and functions it names (`note.options`, `note.functions`) named
 * by `naming`: by default the naming in force (the library's own, or the one {@link withNaming} gives).
 *
 * @example
 * noteText({ message: 'the label decides (give `density`)', options: ['density'] })                                           // 'the label decides (give `density`)'
 * noteText({ message: 'the label decides (give `density`)', options: ['density'] }, { option: (n) => `--${n}`, command: (f) => f }) // 'the label decides (give --density)'
 */
export function noteText(note: Named & { message: string }, naming: OptionNaming = notesNaming): string {
  return nameOptions(note.message, note, naming);
}

const OPEN: Record<string, string> = { '(': ')', '[': ']', '{': '}' };
const CLOSE: Record<string, string> = { ')': '(', ']': '[', '}': '{' };
const at = (column: number | undefined) => (column === undefined ? '' : ` at column ${column}`);
const grouped = (n: number) => n.toLocaleString('en-US');

type Render<C extends TypedCode> = (f: IssueFields[C], column: number | undefined) => string;

/** The message of each typed code, from its fields (and its column, where the words say it). */
const MESSAGES: { [C in TypedCode]: Render<C> } = {
  EMPTY_INPUT: (f) => (f.stateSymbol === null ? 'the formula is empty' : `only a state symbol, '${f.stateSymbol}', and no formula`),
  INPUT_TOO_LONG: (f) => `the formula is ${grouped(f.characters)} characters long; the limit is ${grouped(f.limit)}`,
  CONTROL_CHARACTER: (f) => `control character U+${f.codePoint.toString(16).toUpperCase().padStart(4, '0')} in the formula`,
  UNEXPECTED_CHARACTER: (f, c) => `unexpected character '${f.character}'${at(c)}`,
  UNEXPECTED_TOKEN: (f, c) => {
    if (f.token === null) return `the formula ends too early${f.after === null ? '' : ` after '${f.after}'`}: expected an element symbol or an opening bracket`;
    switch (f.expected) {
      case 'count-place':
        return `unexpected count '${f.token}'${at(c)}: a count follows an element symbol or a closing bracket`;
      case 'addition-dot':
        return `unexpected '${f.token}'${at(c)}: the addition dot stands between two formulas, as in CuSO4·5H2O`;
      case 'superscript':
        return `superscript digits${at(c)} must be a mass number before an element symbol (¹³C) or a charge ending in ⁺ or ⁻`;
      default:
        return `unexpected '${f.token}'${at(c)}`;
    }
  },
  UNKNOWN_ELEMENT: (f) => `unknown element symbol '${f.symbol}'`,
  UNKNOWN_ISOTOPE: (f) => (f.massNumber === null ? `'${f.symbol}' already names a hydrogen isotope; it takes no mass number` : `no nuclide ${f.symbol}-${f.massNumber} is known (AME2020 lists none)`),
  UNCLOSED_GROUP: (f, c) => `'${f.bracket}'${at(c)} is never closed`,
  UNMATCHED_CLOSING: (f) => `'${f.bracket}' has no opening '${CLOSE[f.bracket] ?? '?'}'`,
  MISMATCHED_BRACKET: (f, c) => `'${f.bracket}'${at(c)} closes '${f.opening}' from column ${f.openingColumn}; expected '${OPEN[f.opening] ?? '?'}'`,
  EMPTY_GROUP: (f) => `empty brackets '${f.bracket}${OPEN[f.bracket] ?? ''}'`,
  NESTING_TOO_DEEP: (f) => `brackets nested more than ${f.limit} deep`,
  BAD_COUNT: (f) => {
    switch (f.problem) {
      case 'leading-zero':
        return `count '${f.count}' has a leading zero`;
      case 'decimals':
        return `count '${f.count}' has more than ${f.limit} decimals`;
      case 'fraction-decimals':
        return `the fraction '${f.count}' has more than ${f.limit} decimals`;
      case 'divides-by-zero':
        return `the fraction '${f.count}' divides by zero`;
      case 'zero-multiplier':
        return 'a multiplier of zero; leave the part out instead';
      default:
        return 'a count of zero; leave the part out instead';
    }
  },
  COUNT_TOO_LARGE: (f) => `count ${f.count} is too large; counts go up to ${grouped(f.limit)}`,
  BAD_CHARGE: (f) => (Number(f.charge) === 0 ? 'a charge of zero; leave it out' : `charge ${f.charge} is out of range (at most ${f.limit})`),
  AMBIGUOUS_CHARGE: (f) => `the '${f.written}' after '${f.digits}' leaves unclear which of the digits are a count and which a charge`,
  MISPLACED_CHARGE: (f, c) =>
    f.following === null
      ? `a charge must come at the end of the formula, after a symbol, count or bracket; unexpected '${f.charge}'${at(c)}`
      : `a charge must come at the end of the formula; '${f.following}' follows the charge '${f.charge}'`,
  SPACE_IN_FORMULA: (f, c) => `a space${at(c)} inside the formula: pondus does not join the pieces around it, because '${f.joined}' may be a different substance from what was meant`,
  INEXACT_FRACTION: (f) => `the multiplier ${f.numerator}/${f.denominator} has no exact decimal form, and pondus keeps counts exact`,
  NO_STANDARD_WEIGHT: (f) => `${f.name} (${f.symbol}) has no standard atomic weight, so the molar mass has no uncertainty by this method`,
  PART_NOT_IN_FORMULA: (f) => `${f.part} is not part of ${f.formula}: the formula lacks ${f.lacking.join(', ') || 'enough atoms'}`,
  UNKNOWN_UNIT: (f, c) => (f.inExpression ? `unknown unit or word '${f.unit}'${at(c)}` : `unknown unit '${f.unit}'`),
  INCOMPATIBLE_UNITS: (f) => {
    const dim = (d: string | null) => d ?? 'no unit';
    switch (f.operation) {
      case 'add':
        return `cannot add ${f.first} (${dim(f.firstDimension)}) and ${f.second} (${dim(f.secondDimension)})`;
      case 'subtract':
        return `cannot subtract ${f.second} (${dim(f.secondDimension)}) from ${f.first} (${dim(f.firstDimension)})`;
      case 'dilute':
        return `the ${f.first} and ${f.second} concentrations must be of the same kind (both molar, both mass per volume, or both %)`;
      case 'mix':
        return 'the target, higher and lower strengths must be given in the same kind of unit (all %, all mg/mL, …)';
      default:
        return `the result is ${f.firstDimension ?? 'a pure number'}, not convertible to ${f.second}`;
    }
  },
  NUMBER_OUT_OF_RANGE: (f) => {
    switch (f.reading) {
      case 'exponent':
        return `'${f.value}' is out of range (exponents up to ±${f.exponentLimit})`;
      case 'number':
        return `'${f.value}' is out of range: numbers are read from 1e-${f.exponentLimit} to 1e${f.exponentLimit} in size, so that every result is a finite JSON number`;
      case 'fraction':
        return `'${f.value}' is beyond the range of exact fractions (10^±${f.exponentLimit})`;
      case 'result':
        return `the result, about ${f.value}, is beyond the range of numbers pondus reports (1e-${f.exponentLimit} to 1e${f.exponentLimit})`;
      default:
        return `${f.what ?? 'the measurement'} is out of the range pondus takes for a measurement (10^±${f.exponentLimit} of the base unit): '${f.value}'`;
    }
  },
  SEARCH_TOO_LARGE: (f) => {
    switch (f.search) {
      case 'candidates': {
        const size = f.estimate === null ? `has more than ${grouped(f.walkLimit ?? 0)} combinations of the other elements to walk before carbon and hydrogen` : `would visit about ${grouped(f.estimate)} formulas`;
        return `the search ${size} (${f.window ?? ''}), more than pondus answers within about a second (at most ${grouped(f.limit)} formulas): narrow the window (\`ppm\`), the element ranges (\`elements\`, e.g. fewer halogens or a smaller N and O range), or add found percents (\`found\`)`;
      }
      case 'elements':
        return `the search for a formula of ${f.elements} elements within these limits visits more than ${grouped(f.limit)} count combinations, more than pondus answers within about a second: give a molar mass (\`molarMass\`), a tighter \`tolerance\` if the analysis is better than ±0.3 points, or search near a measured mass with the candidates command`;
      default:
        return `the molar mass and these limits leave about ${grouped(f.estimate ?? 0)} count combinations, more than pondus searches within about a second: narrow the molar-mass range or the tolerance, or search near a measured mass with the candidates command`;
    }
  },
};

/**
 * The words of an issue. A typed issue's message is made from its machine fields when it is made
 * ({@link typedIssue}); a caller may reword it under the same fields (a command putting its
 * context first), and that message is kept. An issue given with an empty message gets the words
 * of its fields.
 * The options it names (`issue.options`) are named by `naming` (by default the library's own).
 *
 * @example
 * messageFor({ code: 'UNKNOWN_ELEMENT', symbol: 'Xx', message: '' })                        // "unknown element symbol 'Xx'"
 * messageFor({ code: 'COUNT_TOO_LARGE', count: '1234567890', limit: 999999999, message: '' }) // 'count 1234567890 is too large; counts go up to 999,999,999'
 */
export function messageFor(issue: Issue, naming: OptionNaming = LIBRARY_NAMING): string {
  let text = issue.message;
  if (text === '' && hasFields(issue)) {
    const made = (MESSAGES[issue.code] as Render<TypedCode>)(issue as IssueFields[TypedCode], issue.column);
    text = made;
  }
  return nameOptions(text, issue, naming);
}

/**
 * An issue in one line, as a CSV or TSV message cell writes it: the message with the column it is
 * about once, at its end (`(column N)`; a message made from its fields is made without its own
 * "at column N" for that, one reworded or written by hand keeps its words and gets none when it
 * names a column already), then the hint, when there is one (`; hint: …`).
 *
 * @example
 * issueLine(typedIssue({ code: 'UNCLOSED_GROUP', bracket: '(', column: 3, length: 1 })) // "'(' is never closed (column 3)"
 * issueLine({ code: 'BAD_OPTION', message: 'no such form', hint: 'give `density`', options: ['density'] }) // 'no such form; hint: give `density`'
 */
export function issueLine(issue: Issue, naming: OptionNaming = LIBRARY_NAMING): string {
  const column = issue.column;
  let text: string;
  if (column !== undefined && hasFields(issue) && issue.message === (MESSAGES[issue.code] as Render<TypedCode>)(issue as IssueFields[TypedCode], column)) {
    text = `${nameOptions((MESSAGES[issue.code] as Render<TypedCode>)(issue as IssueFields[TypedCode], undefined), issue, naming)} (column ${column})`;
  } else {
    const message = messageFor(issue, naming);
    text = column === undefined || /\bcolumns? \d/.test(message) ? message : `${message} (column ${column})`;
  }
  const hint = hintFor(issue, naming);
  return hint === undefined ? text : `${text}; hint: ${hint}`;
}

/**
 * An issue's hint with the options it names named by `naming`, or undefined when it has none.
 *
 * @example
 * hintFor({ code: 'BAD_OPTION', message: 'm', hint: 'give `density`', options: ['density'] }, { option: (n) => `--${n}`, command: (f) => f }) // 'give --density'
 */
export function hintFor(issue: Issue, naming: OptionNaming = LIBRARY_NAMING): string | undefined {
  return issue.hint === undefined ? undefined : nameOptions(issue.hint, issue, naming);
}

/**
 * The hint for a bare sign after digits (AMBIGUOUS_CHARGE): the same text written each way its
 * digits split into a count and a charge, in the order given (the likeliest first), each with its
 * reading. `head` is the formula before the digits; a reading's `count` is '' for none, its
 * `charge` '' for a charge of 1. It offers only readings of the text as written, never another
 * formula.
 *
 * @example
 * chargeReadingsHint('SO', '-', [{ count: '4', charge: '2' }, { count: '42', charge: '' }, { count: '', charge: '42' }])
 * // 'write SO4^2- (count 4, charge 2-), SO42^- (count 42, charge 1-) or SO^42- (charge 42-)'
 */
export function chargeReadingsHint(head: string, sign: '+' | '-', readings: readonly { count: string; charge: string }[]): string {
  const each = readings.map((r) => {
    const how = `${r.count === '' ? '' : `count ${r.count}, `}charge ${r.charge === '' ? '1' : r.charge}${sign}`;
    return `${head}${r.count}^${r.charge}${sign} (${how})`;
  });
  const listed = each.length <= 1 ? each.join('') : `${each.slice(0, -1).join(', ')} or ${each[each.length - 1]}`;
  return `write ${listed}`;
}

/**
 * Replaces each `` `fn` `` of the functions named and each `` `name` `` or `` `name: value` `` of
 * the options named by the naming's words for it.
 */
function nameOptions(text: string, named: Named, naming: OptionNaming): string {
  if ((!named.options && !named.functions) || naming === LIBRARY_NAMING) return text;
  let out = text;
  for (const fn of named.functions ?? []) out = out.replaceAll(`\`${fn}\``, () => naming.command(fn));
  for (const name of named.options ?? []) {
    out = out.replace(new RegExp(`\`${name.replace(/[^A-Za-z0-9]/g, '')}(?:: ([^\`]*))?\``, 'g'), (_m, value: string | undefined) => naming.option(name, value));
  }
  return out;
}

/**
 * Makes a typed issue from its code, fields and position: the message is made by
 * {@link messageFor}, so it cannot drift from the fields.
 *
 * @example
 * typedIssue({ code: 'UNKNOWN_ELEMENT', symbol: 'Qq', column: 3, length: 2 }).message // "unknown element symbol 'Qq'"
 */
export function typedIssue<C extends TypedCode>(fields: Omit<TypedIssue<C>, 'message'>): TypedIssue<C> {
  const { code, ...rest } = fields as { code: C };
  const issue = { code, message: '', ...rest } as unknown as TypedIssue<C>;
  issue.message = messageFor(issue as Issue);
  return issue;
}
