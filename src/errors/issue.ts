/**
 * Errors as data: every problem pondus reports is an {@link Issue} with a stable
 * code, a plain-English message and, where it applies, the column it points at.
 */

/** Stable machine-readable codes. Scripts may rely on them; messages may change. */
export type IssueCode =
  // formula text
  | 'EMPTY_INPUT'
  | 'INPUT_TOO_LONG'
  | 'CONTROL_CHARACTER'
  | 'UNEXPECTED_CHARACTER'
  | 'UNEXPECTED_TOKEN'
  | 'UNKNOWN_ELEMENT'
  | 'UNKNOWN_ISOTOPE'
  | 'UNCLOSED_GROUP'
  | 'UNMATCHED_CLOSING'
  | 'MISMATCHED_BRACKET'
  | 'EMPTY_GROUP'
  | 'NESTING_TOO_DEEP'
  | 'BAD_COUNT'
  | 'COUNT_TOO_LARGE'
  | 'BAD_CHARGE'
  | 'AMBIGUOUS_CHARGE'
  | 'MISPLACED_CHARGE'
  | 'SPACE_IN_FORMULA'
  | 'AMBIGUOUS_READING'
  | 'INEXACT_FRACTION'
  // computing with formulas
  | 'NO_STANDARD_WEIGHT'
  | 'PART_NOT_IN_FORMULA'
  // ions and isotope patterns
  | 'BAD_ION'
  | 'ION_CONFLICT'
  | 'PATTERN_TOO_LARGE'
  // quantities, units and expressions
  | 'BAD_NUMBER'
  | 'UNKNOWN_UNIT'
  | 'INCOMPATIBLE_UNITS'
  | 'DIVISION_BY_ZERO'
  | 'NUMBER_OUT_OF_RANGE'
  | 'BAD_EXPRESSION'
  // measurements and results
  | 'BAD_MEASUREMENT'
  | 'NO_FORMULA_FITS'
  | 'SEARCH_TOO_LARGE'
  | 'BAD_EQUATION'
  | 'NO_BALANCE'
  | 'NOT_UNIQUE'
  | 'BAD_AMOUNT'
  | 'BAD_OPTION'
  | 'AMBIGUOUS_PURITY'
  | 'CONCENTRATED_REAGENT'
  // one form of a reagent weighed in place of another that is a different substance (NaCl for Na2CO3)
  | 'FORMS_UNRELATED'
  | 'BAD_RECORD'
  | 'USAGE'
  // a public function called with an argument of the wrong kind (a number for a formula, null options)
  | 'BAD_ARGUMENT'
  | 'INTERNAL_ERROR';

/** What every issue carries, whatever its code. */
interface IssueBase {
  /** The problem in words, made from the machine fields by {@link messageFor} where the code has them. */
  message: string;
  /** 1-based column of the first character the issue is about. */
  column?: number;
  /** How many characters from `column` the issue covers (at least 1 when a column is given). */
  length?: number;
  /** A suggestion for what the user may have meant. */
  hint?: string;
  /**
   * The library options the message or hint names, by their names in the options objects
   * (`abbreviations`, `molarMass`). The text writes each as `` `name` `` (or `` `name: value` ``);
   * the command line shows its flag instead (see `messageFor`). A script reads here which options a
   * BAD_OPTION or USAGE issue is about.
   */
  options?: string[];
  /**
   * The library functions the message or hint names, written `` `diluteByMass` `` in the text; the
   * command line names its command instead (`dilute --mass`, see `FLAG_NAMING`).
   */
  functions?: LibraryFunction[];
}

/**
 * The library functions a message or note may point to (for another way to reach the result), each
 * with a command-line form in `FLAG_NAMING`.
 */
export type LibraryFunction = 'candidateFormulas' | 'compositionCsvLongRows' | 'concentratedReagent' | 'diluteByMass' | 'dilutionSeries' | 'empirical' | 'formulaMass' | 'milliequivalents';

/**
 * The machine fields of each code that has them: what a script may read without parsing the
 * message. `messageFor` renders the message from these fields alone.
 */
export interface IssueFields {
  EMPTY_INPUT: { stateSymbol: string | null };
  INPUT_TOO_LONG: { characters: number; limit: number };
  CONTROL_CHARACTER: { codePoint: number };
  UNEXPECTED_CHARACTER: { character: string };
  UNEXPECTED_TOKEN: { token: string | null; after: string | null; expected: 'formula' | 'count-place' | 'addition-dot' | 'superscript' | null };
  UNKNOWN_ELEMENT: { symbol: string };
  UNKNOWN_ISOTOPE: { symbol: string; massNumber: number | null };
  UNCLOSED_GROUP: { bracket: string };
  UNMATCHED_CLOSING: { bracket: string };
  MISMATCHED_BRACKET: { bracket: string; opening: string; openingColumn: number };
  EMPTY_GROUP: { bracket: string };
  NESTING_TOO_DEEP: { limit: number };
  BAD_COUNT: { count: string; problem: 'leading-zero' | 'decimals' | 'fraction-decimals' | 'zero' | 'zero-multiplier' | 'divides-by-zero'; limit: number | null };
  COUNT_TOO_LARGE: { count: string; limit: number };
  BAD_CHARGE: { charge: string; limit: number };
  AMBIGUOUS_CHARGE: { sign: string; digits: string; written: string };
  MISPLACED_CHARGE: { charge: string; following: string | null };
  SPACE_IN_FORMULA: { joined: string };
  INEXACT_FRACTION: { numerator: number; denominator: number };
  /** The element's symbol and name. */
  NO_STANDARD_WEIGHT: { symbol: string; name: string };
  /** The part and the formula in Hill order, and the elements of the part the formula has none of. */
  PART_NOT_IN_FORMULA: { part: string; formula: string; lacking: string[] };
  /** The unit or word as written; `inExpression` when it stands in a calculator expression, where it may be a mistyped word. */
  UNKNOWN_UNIT: { unit: string; inExpression: boolean };
  /**
   * Two quantities of different dimensions: added or subtracted (`first` and `second` as written),
   * a result asked for in a unit of another dimension (`convert`: `first` null, `second` the unit),
   * a stock and a target concentration of different kinds (`dilute`: `first` 'stock', `second`
   * 'target'), or strengths to mix by alligation in units of different kinds (`mix`: `first`
   * 'target', `second` the strength that differs, 'higher' or 'lower'). Each dimension is in the
   * base units pondus writes it in (`g`, `M`, `g/L`), null for a pure number.
   */
  INCOMPATIBLE_UNITS: { operation: 'add' | 'subtract' | 'convert' | 'dilute' | 'mix'; first: string | null; firstDimension: string | null; second: string; secondDimension: string | null };
  /**
   * A number beyond what pondus reads or reports: `value` as written (or the result, to 3 figures),
   * `exponentLimit` the largest power of ten in size (10^±limit), `reading` what was read: an
   * exponent, a number, an exact fraction, a calculator result, or a measurement (`what` names it).
   */
  NUMBER_OUT_OF_RANGE: { value: string; exponentLimit: number; reading: 'exponent' | 'number' | 'fraction' | 'result' | 'measurement'; what: string | null };
  /**
   * A search refused up front: `estimate` the formulas (or count combinations) it would visit, null
   * when it gave up counting past `walkLimit` branches; `limit` what pondus searches within about a
   * second. `candidates` searches a mass window (`window` describes it); `elements` the formula of
   * `elements` elements from percents; `molecular` the formulas within a molar mass.
   */
  SEARCH_TOO_LARGE: { search: 'candidates' | 'elements' | 'molecular'; estimate: number | null; limit: number; walkLimit: number | null; elements: number | null; window: string | null };
}

/** The codes with machine fields. */
export type TypedCode = keyof IssueFields;

/** An issue of a code with machine fields: the code, its fields, and the message made from them. */
export type TypedIssue<C extends TypedCode = TypedCode> = { [K in C]: { code: K } & IssueFields[K] & IssueBase }[C];

/**
 * An issue made with its message only: the codes without machine fields, and, while the migration
 * goes on, a typed code made by a place that gives no fields yet (or that re-words an issue under
 * its code). It carries none of the machine fields; {@link hasFields} tells the two forms apart.
 */
export type MessageIssue = { code: IssueCode } & IssueBase & { [K in keyof AllFields]?: never };

type AllFields = UnionToIntersection<IssueFields[TypedCode]>;
type UnionToIntersection<U> = (U extends unknown ? (x: U) => void : never) extends (x: infer I) => void ? I : never;

/**
 * One problem found in an input, keyed by its code. `column` is 1-based and counts Unicode code
 * points. A code in {@link IssueFields} carries its machine fields (`UNKNOWN_ELEMENT` its
 * `symbol`, `COUNT_TOO_LARGE` its `count` and `limit`); every issue carries `message`.
 */
export type Issue = TypedIssue | MessageIssue;

/** The machine fields each typed code must carry, for {@link hasFields}. */
const FIELD_NAMES: { [C in TypedCode]: (keyof IssueFields[C])[] } = {
  EMPTY_INPUT: ['stateSymbol'],
  INPUT_TOO_LONG: ['characters', 'limit'],
  CONTROL_CHARACTER: ['codePoint'],
  UNEXPECTED_CHARACTER: ['character'],
  UNEXPECTED_TOKEN: ['token', 'after', 'expected'],
  UNKNOWN_ELEMENT: ['symbol'],
  UNKNOWN_ISOTOPE: ['symbol', 'massNumber'],
  UNCLOSED_GROUP: ['bracket'],
  UNMATCHED_CLOSING: ['bracket'],
  MISMATCHED_BRACKET: ['bracket', 'opening', 'openingColumn'],
  EMPTY_GROUP: ['bracket'],
  NESTING_TOO_DEEP: ['limit'],
  BAD_COUNT: ['count', 'problem', 'limit'],
  COUNT_TOO_LARGE: ['count', 'limit'],
  BAD_CHARGE: ['charge', 'limit'],
  AMBIGUOUS_CHARGE: ['sign', 'digits', 'written'],
  MISPLACED_CHARGE: ['charge', 'following'],
  SPACE_IN_FORMULA: ['joined'],
  INEXACT_FRACTION: ['numerator', 'denominator'],
  NO_STANDARD_WEIGHT: ['symbol', 'name'],
  PART_NOT_IN_FORMULA: ['part', 'formula', 'lacking'],
  UNKNOWN_UNIT: ['unit', 'inExpression'],
  INCOMPATIBLE_UNITS: ['operation', 'first', 'firstDimension', 'second', 'secondDimension'],
  NUMBER_OUT_OF_RANGE: ['value', 'exponentLimit', 'reading', 'what'],
  SEARCH_TOO_LARGE: ['search', 'estimate', 'limit', 'walkLimit', 'elements', 'window'],
};

/**
 * True when the issue is of a typed code and carries its machine fields.
 *
 * @example
 * hasFields({ code: 'UNKNOWN_ELEMENT', symbol: 'Xx', message: "unknown element symbol 'Xx'" }) // true
 * hasFields({ code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Xx'" })               // false
 */
export function hasFields(issue: Issue): issue is TypedIssue {
  const names = (FIELD_NAMES as Record<string, string[] | undefined>)[issue.code];
  return names !== undefined && names.every((n) => Object.hasOwn(issue, n));
}

/** The codes of the notes pondus attaches to results: stable, for scripts. */
export type NoteCode =
  // reading formulas
  | 'ABBREVIATION'
  | 'ABBREVIATION_CLASH'
  | 'CASE_CHECK'
  | 'DECIMAL_COUNT'
  | 'DOT_AS_ADDITION'
  | 'ELEMENT_NOT_ABBREVIATION'
  | 'FRACTION_AS_DECIMAL'
  | 'NAME_READ'
  | 'NAMED_COMPONENT'
  | 'STATE_SYMBOL'
  | 'JOINED_ARGUMENTS'
  // masses, composition, isotopes and ions
  | 'CHARGED_FORMULA'
  | 'CSV_ELEMENTS'
  | 'ELEMENTS_OF_FORMULAS'
  | 'ION_MOLAR_MASS'
  | 'IONS_GIVEN'
  | 'IONS_READ'
  | 'LARGE_FORMULA'
  | 'LARGE_MASS_ERROR'
  | 'LIGHTER_ISOTOPES'
  | 'MONOISOTOPIC_NOT_SHOWN'
  | 'MOST_ABUNDANT_PEAK'
  | 'NO_NATURAL_ISOTOPES'
  | 'NON_INTEGER_COUNTS'
  | 'NOT_UNIQUE_FROM_ATOMS'
  | 'PART_FROM_ATOMS'
  | 'PATTERN_COMPARED'
  | 'SVG_WRITTEN'
  | 'UNUSUAL_CHARGE'
  | 'WHOLE_FORMULA'
  // measured numbers
  | 'BELOW_PRECISION'
  | 'EXACT_NUMBER'
  | 'FEW_DECIMALS'
  | 'MEASUREMENT'
  | 'REPORTED_TO_UNCERTAINTY'
  | 'RULES_NOT_APPLIED'
  | 'TARGET_FEW_FIGURES'
  | 'TRAILING_ZEROS'
  | 'UNIT_APPLIED_TO_ALL'
  | 'WORKING_PRECISION'
  // analysis and formulas from measurements
  | 'BY_DIFFERENCE'
  | 'DATA_CANNOT_DECIDE'
  | 'DIFFERENCE_ADDED'
  | 'IMPOSSIBLE_PERCENT'
  | 'PAIRS_NOT_SEARCHED'
  | 'NO_COLUMN'
  | 'NOT_A_MULTIPLE'
  | 'OWN_FOUND_VALUES'
  | 'PARTNER_NOT_OFFERED'
  | 'UNACCOUNTED'
  | 'COMPOUND_CONVERTED'
  // reactions and the reagent table
  | 'ASSUMED_EXCESS'
  | 'BALANCED_AS_WRITTEN'
  | 'BELOW_ONE_EQUIV'
  | 'CATALYST'
  | 'CHARGE_AS_WRITTEN'
  | 'CHARGE_IMBALANCE'
  | 'COEFFICIENTS_FIXED'
  | 'COEFFICIENTS_REPLACED'
  | 'ELECTRON_PARITY'
  | 'EQUIV_COMPUTED'
  | 'EQUIV_OF'
  | 'NOT_IN_STOICHIOMETRY'
  | 'PRODUCT_RATIO'
  | 'SOLVENT_VOLUME'
  // solutions and dilutions
  | 'ADD_ACID_TO_WATER'
  | 'ADD_SLOWLY'
  | 'DENSITY_AS_G_PER_ML'
  | 'DENSITY_FROM_TABLE'
  | 'DENSITY_UNIT'
  | 'DILUENT'
  | 'FACTOR_AS_TOTAL'
  | 'FORM_ROUNDED'
  | 'FORMS_DIFFER'
  | 'GEOMETRIC_DILUTION'
  | 'HYDRATE_WATER_COUNTED'
  | 'MADE_FROM_TAKEN'
  | 'CONCENTRATED_STOCK'
  | 'CONCENTRATION_OF_REAGENT'
  | 'PURITY_AS_MASS_FRACTION'
  | 'SOLUBILITY_EXCEEDED'
  | 'SOLUBILITY_NEAR'
  | 'REAGENT_HANDLING'
  | 'MADE_FROM_WEIGHED'
  | 'MASS_FRACTION'
  | 'MASS_TOO_SMALL'
  | 'METAL_SALT'
  | 'MIX_EACH_STEP'
  | 'PERCENT_AS_W_V'
  | 'PERCENT_AS_W_W'
  | 'PPM_AS_MG_PER_L'
  | 'PPB_AS_UG_PER_L'
  | 'UNIT_NOT_CONVERTED'
  | 'PURITY_APPLIED'
  | 'PURITY_AS_FRACTION'
  | 'PURITY_ASSUMED'
  | 'PURITY_OF_FORM_WEIGHED'
  | 'PURITY_OF_PART'
  | 'PURITY_OF_REAGENT'
  | 'SERIAL_DILUTION'
  | 'SERIAL_PLAN'
  | 'SMALL_TRANSFER'
  | 'SOLUTION'
  | 'VOLUMES_ADDITIVE'
  | 'WEIGHED_FORM'
  // assays, QC and pharmacy
  | 'ALLIGATION_PARTS'
  | 'BACK_TITRATION'
  | 'BASIS_CONVERTED'
  | 'BASIS_INFERRED'
  | 'BLANK_DIFFERENCE'
  | 'BLANK_SUBTRACTED'
  | 'COMPLETE_DISSOCIATION'
  | 'FROM_AS_IS'
  | 'INTERVAL_FINER_THAN_DATA'
  | 'LABEL_NOMINAL'
  | 'LABEL_PURE'
  | 'LIMITS_ROUNDING'
  | 'RESULT_COARSER_THAN_LIMITS'
  | 'MEASURED_STRENGTH'
  | 'MEQ_PER_MMOL'
  | 'EQUIVALENTS_STRENGTH'
  | 'EQUIVALENTS_DILUTED'
  | 'NO_BLANK'
  | 'NO_OUTLIER_TEST'
  | 'NO_SPREAD'
  | 'NOMINAL_STRENGTH'
  | 'POTENCY_AS_IS'
  | 'RATIO'
  | 'RATIO_AS_W_V'
  | 'RATIO_ASSUMED'
  | 'RATIO_GIVEN'
  | 'RATIO_ROUNDED'
  | 'STUDENT_T'
  // a value past what is possible or usual, computed anyway
  | 'ABOVE_100_PERCENT'
  | 'ASSAY_ABOVE_100'
  | 'RESULT_OVER_100'
  | 'SUM_OVER_100'
  | 'YIELD_OVER_100'
  | 'YIELD_OF_FIRST_PRODUCT'
  | 'NO_FORMULA_FITS'
  | 'NO_STANDARD_WEIGHT'
  | 'AMMONIA_AS_NH3'
  | 'AMMONIA_AS_NH4OH'
  | 'PERCENT_AS_V_V'
  | 'NON_ELECTROLYTE'
  | 'ANHYDROUS_DEXTROSE'
  // the caution of a result that will be acted on, as a CSV notes item
  | 'CAUTION'
  | 'WEIGHTS_ABRIDGED'
  | 'PATTERN_AVERAGE'
  | 'PERCENT_PER_VOLUME'
  | 'EQUILIBRIUM_ARROW'
  | 'STOICHIOMETRIC_AMOUNTS'
  | 'PART_MULTIPLIER';

/** A remark attached to a successful result (an assumption made, a value flagged). */
export interface Note {
  code: NoteCode;
  /** The remark in words, naming options and functions as the library does (see `options`). */
  message: string;
  column?: number;
  /**
   * The library options the message names, by their names in the options objects (`density`,
   * `basis`). The text writes each as `` `name` `` (or `` `name: value` ``); the command line shows
   * its flag instead (see `noteText`).
   */
  options?: string[];
  /** The library functions the message names (`` `dilutionSeries` ``); the command line names its command instead. */
  functions?: LibraryFunction[];
}
