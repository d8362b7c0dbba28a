import { Decimal } from '../exact/decimal.js';
import { getAtomData } from '../elements/atom-data.js';
import { asPondusError, PondusError, toSafe, type SafeResult } from './pondus-error.js';
import { OPTION_KINDS } from './option-kinds.js';

/**
 * The shapes of the library's own values and of the options objects with required fields, as the
 * boundary checks them: a few top-level fields each, never a walk of a value's inner arrays, so a
 * check costs the same for a formula of two atoms as for a result of thousands of peaks. A field
 * kind is one of `text`, `number`, `boolean`, `array`, `object` (non-null), `decimal`, `map`,
 * `function`, another shape's name, or one of those with `|null` (null accepted) or `?` (absent
 * accepted).
 */
const SHAPES = {
  parsed: { name: 'a parsed formula (from parseFormula)', fields: { components: 'array' } },
  massResult: { name: 'a mass result (from formulaMass)', fields: { input: 'text', formula: 'text', molarMass: 'number', molarMassExact: 'text', monoisotopicMass: 'number', monoisotopicMassExact: 'text', charge: 'number', notes: 'array' } },
  // the detail's Decimal values are getters computed on first use: the check reads plain fields only
  massDetail: { name: 'a detailed mass result (from formulaMassDetail)', fields: { input: 'text', molarMassNumber: 'function', vector: 'object', tree: 'parsed', notes: 'array' } },
  compositionResult: { name: 'a composition result (from composition)', fields: { input: 'text', formula: 'text', molarMass: 'number', molarMassExact: 'text', elements: 'array', part: 'object|null', notes: 'array' } },
  measured: { name: 'a Measured (a Decimal value with its precision)', fields: { value: 'decimal', lsd: 'number|null', sigFigs: 'number?' } },
  quantity: { name: 'a Quantity (from measure or quantity)', fields: { value: 'decimal', lsd: 'number|null', sigFigs: 'number?', dims: 'array', unit: 'unitObject|null', grad: 'map' } },
  unitObject: { name: 'a unit (from unitOf)', fields: { symbol: 'text', exp10: 'number', dims: 'array' } },
  instruction: { name: 'an instruction (a mass to weigh, a volume to take)', fields: { quantity: 'quantity', inputs: 'array', textbookSigFigs: 'number|null' } },
  calcResult: { name: 'a calculator result (from calc)', fields: { input: 'text', value: 'decimal', rounded: 'decimal', display: 'text', unit: 'text', uncertainty: 'decimal|null', notes: 'array' } },
  mixtureResult: { name: 'a mixture result (from mixtureComposition)', fields: { input: 'text', total: 'measured', components: 'array', elements: 'array', unaccounted: 'object|null', notes: 'array' } },
  analysisResult: { name: 'an analysis result (from analysis)', fields: { input: 'text', formula: 'text', calculated: 'object', found: 'object', deviation: 'object', fits: 'array', continuous: 'array', notes: 'array' } },
  equation: { name: 'a parsed equation (from parseEquation)', fields: { input: 'text', reactants: 'array', products: 'array', catalysts: 'array', notes: 'array' } },
  balanceResult: { name: 'a balance result (from balance)', fields: { input: 'text', balanced: 'text', species: 'array', coefficients: 'array', exactCoefficients: 'array', basis: 'array', catalysts: 'array', notes: 'array' } },
  reactResult: { name: 'a reaction result (from react)', fields: { input: 'text', balanced: 'text', balance: 'balanceResult', extent: 'object', reactants: 'array', products: 'array', excess: 'array', catalysts: 'array', percentYield: 'object|null', notes: 'array' } },
  reagentRow: { name: 'a reagent-table row (from reagentTable)', fields: { input: 'text', role: 'text', spec: 'object', amount: 'object|null', mass: 'object|null', volume: 'object|null', percentYield: 'object|null', notes: 'array' } },
  measurements: { name: 'measurements (from readMeasurements)', fields: { kind: 'text', elements: 'array' } },
  empiricalResult: { name: 'an empirical-formula result (from empirical)', fields: { input: 'text', fit: 'object', alternatives: 'array', percents: 'object', limits: 'object', conversions: 'array', notes: 'array' } },
  candidateResult: { name: 'a candidate-formula result (from candidateFormulas)', fields: { input: 'text', ratios: 'object', candidates: 'array', notes: 'array' } },
  patternResult: { name: 'an isotope pattern (from isotopePattern)', fields: { input: 'text', charge: 'number', peaks: 'array', allPeaks: 'array', notes: 'array' } },
  peak: { name: 'a peak of an isotope pattern', fields: { mz: 'number', abundance: 'number', relative: 'number', shift: 'number' } },
  conversionFactor: { name: 'a conversion factor (from conversionFactor)', fields: { sought: 'massDetail', given: 'massDetail', element: 'text', factor: 'decimal', reported: 'measured' } },
  gravimetricResult: { name: 'a gravimetric result (from gravimetric)', fields: { analyte: 'text', weighed: 'text', factor: 'conversionFactor', analyteMass: 'quantity|null', massPercent: 'quantity|null', notes: 'array' } },
  basisResult: { name: 'a basis conversion (from convertBasis)', fields: { factor: 'conversionFactor', value: 'quantity|null', converted: 'quantity|null', notes: 'array' } },
  solutionResult: { name: 'a solution result (from prepareSolution)', fields: { reagent: 'massDetail', target: 'object', volume: 'quantity', purity: 'quantity|null', moles: 'instruction|null', mass: 'instruction|null', made: 'quantity|null', unit: 'text', notes: 'array' } },
  substituteResult: { name: 'a substitution result (from substituteForm)', fields: { use: 'massDetail', instead: 'massDetail', asked: 'quantity', moles: 'instruction', mass: 'instruction', purity: 'quantity|null', notes: 'array' } },
  concentratedResult: { name: 'a concentrated-reagent result (from concentratedReagent)', fields: { reagent: 'massDetail', fraction: 'quantity', density: 'quantity', densitySource: 'text', molarity: 'quantity', textbookSigFigs: 'number', massConcentration: 'quantity', take: 'instruction|null', factor: 'decimal|null', notes: 'array' } },
  note: { name: 'a note ({ code, message })', fields: { code: 'text', message: 'text' } },
  dilutionResult: { name: 'a dilution result (from dilute)', fields: { stock: 'quantity', target: 'quantity|null', finalVolume: 'quantity', stockVolume: 'instruction|null', solventVolume: 'instruction|null', factor: 'quantity', made: 'quantity|null', written: 'object', notes: 'array' } },
  seriesResult: { name: 'a serial dilution plan (from dilutionSeries)', fields: { factor: 'decimal', stock: 'quantity|null', volume: 'quantity', minTransfer: 'quantity', maxStep: 'decimal', steps: 'array', written: 'object', notes: 'array' } },
  massDilutionResult: { name: 'a dilution by mass (from diluteByMass)', fields: { stock: 'quantity', target: 'quantity', total: 'quantity', take: 'instruction', diluent: 'instruction', factor: 'quantity', written: 'object', notes: 'array' } },
  saltFactorResult: { name: 'a salt/parent factor (from saltFactor)', fields: { salt: 'massDetail', parent: 'massDetail', form: 'text', metalSalt: 'object|null', factor: 'decimal', reported: 'measured', saltMass: 'instruction|null', parentMass: 'quantity|null', notes: 'array' } },
  prepSheetRow: { name: 'a prep-sheet row (from readPrepSheet)', fields: { line: 'number', raw: 'text', id: 'text', reagent: 'text', formula: 'text', purity: 'text', density: 'text', as: 'text', target: 'text', volume: 'text', weighed: 'text', taken: 'text' } },
  prepRowResult: { name: 'a prep-sheet row result (from prepRow)', fields: { row: 'prepSheetRow', kind: 'text', solution: 'solutionResult?', concentrated: 'concentratedResult?' } },
  molarMassUncertainty: { name: 'a molar-mass uncertainty (from molarMassUncertainty)', fields: { value: 'decimal', standardUncertainty: 'decimal', terms: 'array' } },
  milliequivalentResult: { name: 'a milliequivalents result (from milliequivalents)', fields: { salt: 'massDetail', ions: 'object', mode: 'text', mass: 'quantity|null', moles: 'quantity', equivalents: 'quantity', osmoles: 'quantity', perIon: 'array', notes: 'array' } },
  osmolarityResult: { name: 'an osmolarity result (from osmolarity)', fields: { components: 'array', osmolarity: 'quantity', ions: 'array', notes: 'array' } },
  potencyResult: { name: 'a potency result (from potency)', fields: { given: 'quantity', basis: 'text', asIs: 'quantity', weigh: 'instruction|null', notes: 'array' } },
  alligationResult: { name: 'an alligation result (from alligation)', fields: { by: 'text', target: 'object', higherParts: 'quantity', lowerParts: 'quantity', higherFraction: 'quantity', total: 'quantity|null', higherAmount: 'quantity|null', lowerAmount: 'quantity|null', notes: 'array' } },
  strengthForms: { name: 'a strength in its forms (from strengthForms)', fields: { kind: 'text', value: 'quantity', ratio: 'decimal', forms: 'array', notes: 'array' } },
  standardiseResult: { name: 'a standardisation (from standardise)', fields: { standard: 'massDetail', ratio: 'object', moles: 'quantity', netTitre: 'quantity', molarity: 'quantity', notes: 'array' } },
  replicateResult: { name: 'replicate statistics (from replicates)', fields: { n: 'number', mean: 'measured', sd: 'decimal', rsdPercent: 'decimal', halfWidth: 'decimal', reported: 'text', notes: 'array' } },
  titrationResult: { name: 'a titration assay (from titrationAssay)', fields: { analyte: 'massDetail', kind: 'text', ratio: 'object', reagentRatio: 'object|null', netTitre: 'quantity', moles: 'quantity', mass: 'quantity', assay: 'quantity', notes: 'array' } },
  reportedResult: { name: 'a result as reported on its basis (from reportOnBasis)', fields: { basis: 'text', conversion: 'object|null', value: 'quantity', spec: 'object|null', notes: 'array' } },
  atomIsotopes: { name: 'the isotopes of an atom (from atomIsotopes)', fields: { massNumbers: 'array', masses: 'array', fractions: 'array' } },
  // options objects with required fields (each an options object too: weights and rounding are checked)
  titrationOptions: {
    name: 'titration options ({ sample, titrant, volume })',
    fields: { sample: 'text', titrant: 'text', volume: 'text' },
    options: { sample: "a string, the mass of sample taken ('0.5012 g')", titrant: "a string, the molarity of the titrant ('0.1000 M')", volume: "a string, the titre ('24.85 mL')" },
  },
  standardiseOptions: {
    name: 'standardisation options ({ mass, volume })',
    fields: { mass: 'text', volume: 'text' },
    options: { mass: "a string, the mass of primary standard weighed ('0.5105 g')", volume: "a string, the titre ('24.95 mL')" },
  },
  combustionOptions: {
    name: 'combustion options ({ sample, collected })',
    fields: { sample: 'text', collected: 'object' },
    options: { sample: "a string, the sample mass ('1.000 g')", collected: "an object, the masses collected by product ({ co2: '1.499 g', h2o: '0.4091 g' })" },
  },
} as const satisfies Record<string, { name: string; fields: Record<string, string>; options?: Record<string, string> }>;

type ShapeName = keyof typeof SHAPES;

/** The plain kinds: `text` a string; `tree` a string or a parsed formula; and so on (see {@link ParamKind}). */
type PlainKind = 'text' | 'tree' | 'numeric' | 'notation' | 'number' | 'posint' | 'rounding' | 'decimal' | 'object' | 'options' | 'array' | 'map' | 'function' | 'bigint' | 'iterable' | 'error' | 'unit' | 'isotopeKey' | 'atomKeys';
type ArrayKind = `${'text' | 'measured' | 'compositionResult' | 'reagentRow' | 'peak' | 'prepSheetRow' | 'note'}[]`;

/**
 * The kind of value a public function's parameter takes, checked at the public API's boundary:
 * `text` a string; `tree` a string or a parsed formula (an object); `numeric` a number, Decimal or string;
 * `notation` a string or a read ion notation; `number` a number; `decimal` a
 * Decimal; `object` a non-null object; `options` an options object whose `weights` and `rounding`,
 * when given, are among their values; `posint` a whole number of at least 1; `rounding`
 * 'half-even' or 'half-up'; `array`, `map`, `function`, `bigint`, `iterable`; `error` a PondusError
 * with at least one issue; `unit` a unit symbol or a unit object; `isotopeKey` an atom key with
 * isotope data ('C', '13C'); `atomKeys` an iterable (not a string) of atom keys, made an array
 * before the call; a shape name (`massResult`, `quantity`, `titrationOptions`, …: a value the
 * library returned, or an options object with required fields, checked by its top-level fields);
 * `X[]` an array of X, each item checked the same shallow way. A trailing `?` also accepts
 * undefined (an omitted argument); `|null` also accepts null. `any` is not checked.
 */
export type ParamKind = `${PlainKind | ShapeName | ArrayKind}${'' | '?' | '|null' | '|null?'}` | 'any';

const NAMES: Record<PlainKind, string> = {
  text: 'a string',
  tree: 'a formula (a string or a parsed formula)',
  numeric: 'a number, a Decimal or a numeric string',
  notation: 'an ion notation (a string or a read notation)',
  number: 'a number',
  posint: 'a whole number of at least 1',
  rounding: "'half-even' or 'half-up'",
  options: 'an options object',
  decimal: 'a Decimal',
  object: 'an object',
  array: 'an array',
  map: 'a Map',
  function: 'a function',
  bigint: 'a bigint',
  iterable: 'an iterable (an array, a Map, a Set or a string)',
  error: 'a PondusError',
  unit: "a unit (a symbol such as 'mL', or a unit from unitOf)",
  isotopeKey: "an atom key with isotope data ('C', '13C', 'D' is written '2H')",
  atomKeys: "an iterable of atom keys ('C', '13C'), such as an array or a Map's keys()",
};

function describe(v: unknown): string {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'an array';
  if (v instanceof Map) return 'a Map';
  if (typeof v === 'number') return Number.isNaN(v) ? 'NaN' : `the number ${v}`;
  if (typeof v === 'string') return 'a string';
  if (typeof v === 'object') return 'an object';
  return typeof v === 'undefined' ? 'nothing (undefined)' : `a ${typeof v}`;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);
const ATOM_KEY = /^[0-9]*[A-Za-z]+$/;

function isotopeKey(v: unknown): boolean {
  if (typeof v !== 'string' || v.length > 12) return false;
  const m = /^([0-9]*)([A-Za-z]+)$/.exec(v);
  if (!m) return false;
  try {
    return getAtomData(m[2], m[1] ? Number(m[1]) : null) !== undefined;
  } catch {
    return false;
  }
}

function fits(base: PlainKind, v: unknown): boolean {
  switch (base) {
    case 'text':
      return typeof v === 'string';
    case 'tree':
      return typeof v === 'string' || (typeof v === 'object' && v !== null && Array.isArray((v as { components?: unknown }).components));
    case 'numeric':
      return (typeof v === 'number' && Number.isFinite(v)) || typeof v === 'string' || Decimal.isDecimal(v);
    case 'notation':
      return typeof v === 'string' || (typeof v === 'object' && v !== null && Array.isArray((v as { terms?: unknown }).terms));
    case 'number':
      return typeof v === 'number' && !Number.isNaN(v);
    case 'posint':
      return typeof v === 'number' && Number.isSafeInteger(v) && v >= 1;
    case 'rounding':
      return v === 'half-even' || v === 'half-up';
    case 'bigint':
      return typeof v === 'bigint';
    case 'decimal':
      return Decimal.isDecimal(v);
    case 'object':
    case 'options':
      return isObject(v);
    case 'array':
      return Array.isArray(v);
    case 'map':
      return v instanceof Map;
    case 'function':
      return typeof v === 'function';
    case 'iterable':
      return v !== null && v !== undefined && typeof (v as { [Symbol.iterator]?: unknown })[Symbol.iterator] === 'function';
    case 'error':
      return v instanceof PondusError && Array.isArray(v.issues) && v.issues.length > 0 && isObject(v.issues[0]);
    case 'unit':
      return typeof v === 'string' || shapeFault('unitObject', v) === null;
    case 'isotopeKey':
      return isotopeKey(v);
    case 'atomKeys':
      // made an array before the check (see checkArguments)
      return Array.isArray(v) && v.every((k) => typeof k === 'string' && ATOM_KEY.test(k));
  }
}

/** Whether a field holds a value of its field kind (see {@link SHAPES}). */
function fieldFits(kind: string, v: unknown): boolean {
  if (v === undefined && kind.endsWith('?')) return true;
  if (v === null && kind.endsWith('|null')) return true;
  const base = kind.replace(/\|null$|\?$/, '');
  switch (base) {
    case 'text':
      return typeof v === 'string';
    case 'number':
      return typeof v === 'number';
    case 'boolean':
      return typeof v === 'boolean';
    case 'array':
      return Array.isArray(v);
    case 'object':
      return typeof v === 'object' && v !== null;
    case 'decimal':
      return Decimal.isDecimal(v);
    case 'map':
      return v instanceof Map;
    case 'function':
      return typeof v === 'function';
    default:
      return shapeFault(base as ShapeName, v) === null;
  }
}

/**
 * Why a value is not of a shape ('an object without 'notes'', 'an object whose 'dims' is a
 * string'), or null when it is. Reads the shape's top-level fields only (and those of a nested
 * shape), so it costs the same whatever the size of the value.
 */
function shapeFault(shape: ShapeName, v: unknown): string | null {
  if (!isObject(v)) return describe(v);
  const fields = SHAPES[shape].fields as Record<string, string>;
  for (const key in fields) {
    const kind = fields[key];
    const f = v[key];
    if (fieldFits(kind, f)) continue;
    if (f === undefined) return `an object without '${key}'`;
    const nested = kind.replace(/\|null$|\?$/, '');
    const inner = nested in SHAPES ? shapeFault(nested as ShapeName, f) : describe(f);
    return `an object whose '${key}' is ${inner}`;
  }
  return null;
}

/** Why an argument is not of its kind, shown after 'not': the value, or the field or item that is wrong. */
function fault(c: Compiled, v: unknown): string {
  if (c.items !== null) {
    if (!Array.isArray(v)) return describe(v);
    for (let j = 0; j < v.length; j++) {
      if (c.items(v[j])) continue;
      const item = v[j];
      return `an array whose item ${j + 1} is ${c.shape ? shapeFault(c.shape, item) : describe(item)}`;
    }
  }
  if (c.shape) return shapeFault(c.shape, v) ?? describe(v);
  if (c.base === 'atomKeys' && Array.isArray(v)) {
    const j = v.findIndex((k) => !(typeof k === 'string' && ATOM_KEY.test(k)));
    if (j >= 0) return `an iterable whose item ${j + 1} is ${typeof v[j] === 'string' ? `'${String(v[j]).slice(0, 20)}'` : describe(v[j])}`;
  }
  if (c.base === 'isotopeKey' && typeof v === 'string') return `'${v.length > 20 ? v.slice(0, 20) + '…' : v}'`;
  if (c.base === 'unit' && isObject(v)) return shapeFault('unitObject', v) ?? describe(v);
  if (c.base === 'error' && v instanceof PondusError) return 'a PondusError without issues';
  return describe(v);
}

/** The options every function that takes them reads the same way, with the values they may have. */
const OPTION_VALUES: readonly (readonly [string, readonly string[]])[] = [
  ['weights', ['standard', 'abridged']],
  ['rounding', ['half-even', 'half-up']],
];

/** The kind of a value as the option table names kinds. */
function optionKindOf(v: unknown): string {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'array';
  return typeof v;
}

/** The closest known option to a misspelt one (one edit, a swap, or a letter case apart), if any. */
function nearestOption(key: string, known: readonly string[]): string | undefined {
  const k = key.toLowerCase();
  const close = (a: string, b: string): boolean => {
    if (a === b) return true;
    if (Math.abs(a.length - b.length) > 1) return false;
    let i = 0;
    while (i < a.length && i < b.length && a[i] === b[i]) i++;
    const [ra, rb] = [a.slice(i), b.slice(i)];
    return ra.slice(1) === rb.slice(1) || ra.slice(1) === rb || ra === rb.slice(1) || (ra[0] === rb[1] && ra[1] === rb[0] && ra.slice(2) === rb.slice(2));
  };
  return known.find((o) => close(k, o.toLowerCase()));
}

function checkOptions(name: string, i: number, o: Record<string, unknown>): void {
  // an option the function does not take, or of the wrong kind, would be ignored or misread: refused
  const kinds = Object.hasOwn(OPTION_KINDS, name) ? OPTION_KINDS[name] : null;
  if (kinds) {
    for (const [key, kind] of Object.entries(kinds)) {
      if (kind.endsWith('!') && o[key] === undefined) throw new PondusError([{ code: 'BAD_ARGUMENT', message: `${name}: option ${key} (argument ${i + 1}) is required` }]);
    }
    for (const key of Object.keys(o)) {
      const v = o[key];
      // an absent value changes nothing ({ ...options, rounding: undefined }): only a value given is checked
      if (v === undefined) continue;
      if (!Object.hasOwn(kinds, key)) {
        const known = Object.keys(kinds);
        const near = nearestOption(key, known);
        throw new PondusError([{ code: 'BAD_ARGUMENT', message: `${name}: '${key}' (argument ${i + 1}) is not an option of ${name}${near ? `; did you mean '${near}'?` : ''} (its options: ${known.join(', ') || 'none'})` }]);
      }
      const wanted = kinds[key].replace('!', '');
      if (v === undefined || wanted === 'any' || wanted.split('|').includes(optionKindOf(v))) continue;
      throw new PondusError([{ code: 'BAD_ARGUMENT', message: `${name}: option ${key} (argument ${i + 1}) must be ${wanted.split('|').map((w) => (w === 'array' ? 'an array' : w === 'object' ? 'an object' : `a ${w}`)).join(' or ')}, not ${describe(v)}` }]);
    }
  }
  for (const [key, values] of OPTION_VALUES) {
    const v = o[key];
    if (v === undefined || (typeof v === 'string' && values.includes(v))) continue;
    const shown = typeof v === 'string' ? `'${v.length > 40 ? v.slice(0, 40) + '…' : v}'` : describe(v);
    throw new PondusError([{ code: 'BAD_ARGUMENT', message: `${name}: option ${key} (argument ${i + 1}) must be ${values.map((x) => `'${x}'`).join(' or ')}, not ${shown}` }]);
  }
}

/** A parameter's kind, read once when the function is wrapped. */
interface Compiled {
  index: number;
  optional: boolean;
  nullable: boolean;
  base: PlainKind | null;
  shape: ShapeName | null;
  /** For an array kind: the check of each item; null otherwise. */
  items: ((v: unknown) => boolean) | null;
  /** What the parameter must be, for the message. */
  wanted: string;
  test: (v: unknown) => boolean;
  /** Options are checked for weights and rounding too. */
  options: boolean;
}

function compile(kind: ParamKind, index: number): Compiled | null {
  if (kind === 'any') return null;
  const optional = kind.endsWith('?');
  const nullable = kind.includes('|null');
  const bare = kind.replace(/\|null|\?/g, '');
  const array = bare.endsWith('[]');
  const one = array ? bare.slice(0, -2) : bare;
  const shape = one in SHAPES ? (one as ShapeName) : null;
  const base = shape ? null : (one as PlainKind);
  if (!shape && !(one in NAMES)) throw new Error(`guarded: unknown parameter kind '${kind}'`);
  const single = shape ? (v: unknown) => shapeFault(shape, v) === null : (v: unknown) => fits(base!, v);
  const items = array ? single : null;
  const name = shape ? SHAPES[shape].name : NAMES[base!];
  const wanted = (array ? `an array, each item ${name}` : name) + (nullable ? ' or null' : '');
  const test = array ? (v: unknown) => Array.isArray(v) && v.every(single) : single;
  const options = base === 'options' || (shape !== null && 'options' in SHAPES[shape]);
  return { index, optional, nullable, base, shape, items, wanted, test, options };
}

/** Throws a BAD_ARGUMENT PondusError when an argument is not of its parameter's kind. */
function checkArguments(name: string, compiled: readonly Compiled[], args: unknown[]): void {
  for (let k = 0; k < compiled.length; k++) {
    const c = compiled[k];
    let v = args[c.index];
    if (v === undefined && c.optional) continue;
    if (v === null && c.nullable) continue;
    if (c.base === 'atomKeys' && typeof v !== 'string' && !Array.isArray(v) && fits('iterable', v)) {
      // an iterator can be read once only: the function is given the array read here
      v = args[c.index] = Array.from(v as Iterable<unknown>);
    }
    if (c.test(v)) {
      if (c.options) checkOptions(name, c.index, v as Record<string, unknown>);
      continue;
    }
    const why = fault(c, v);
    const at = `argument ${c.index + 1}`;
    // a required option missing or of the wrong kind is named as the option
    const option = c.shape !== null && c.options && isObject(v) ? /^an object (?:without|whose) '([^']+)'/.exec(why) : null;
    const message = option
      ? `${name}: option ${option[1]} (${at}) must be ${(SHAPES[c.shape!] as { options: Record<string, string> }).options[option[1]]}, not ${describe((v as Record<string, unknown>)[option[1]])}`
      : `${name}: ${at} must be ${c.wanted}, not ${why}`;
    throw new PondusError([{ code: 'BAD_ARGUMENT', message }]);
  }
}
const GUARDED = new WeakSet<object>();

/**
 * Wraps a public function so that it answers or throws a {@link PondusError} and nothing else: its
 * arguments are checked against `kinds` first (BAD_ARGUMENT naming the argument), and any other
 * error thrown inside becomes a PondusError (DIVISION_BY_ZERO or INTERNAL_ERROR, the original as
 * `cause`). The wrapper has the function's type and name.
 *
 * @param name - the function's public name, used in messages.
 * @param fn - the function.
 * @param kinds - the kind of each parameter, in order.
 * @returns the guarded function.
 * @throws never itself; the returned function throws only PondusError (BAD_ARGUMENT, INTERNAL_ERROR, or the function's own codes).
 * @example
 * const half = guarded('half', (x) => x / 2, ['number'])
 * half(3) // 1.5
 * let code = ''
 * try { half('3') } catch (e) { if (e instanceof PondusError) code = e.first.code }
 * code // 'BAD_ARGUMENT'
 */
export function guarded<F extends (...args: never[]) => unknown>(name: string, fn: F, kinds: readonly ParamKind[]): F {
  const compiled = kinds.map(compile).filter((c): c is Compiled => c !== null);
  const wrapper = function (this: unknown, ...args: unknown[]) {
    checkArguments(name, compiled, args);
    try {
      return fn.apply(this, args as never[]);
    } catch (e) {
      throw asPondusError(name, e);
    }
  };
  Object.defineProperty(wrapper, 'name', { value: name });
  Object.defineProperty(wrapper, 'length', { value: fn.length });
  GUARDED.add(wrapper);
  return wrapper as unknown as F;
}

/**
 * Whether a function was made by {@link guarded} (the public API's tests check every export).
 *
 * @example
 * isGuarded(guarded('f', () => 1, [])) // true
 * isGuarded(() => 1) // false
 */
export function isGuarded(fn: unknown): boolean {
  return typeof fn === 'function' && GUARDED.has(fn);
}

/**
 * The non-throwing form of a function: `{ success: true, data }`, or `{ success: false, error }`
 * for a PondusError. Every `safe…` function of the public API is made with it from the throwing
 * function, so the two take the same arguments and cannot drift apart.
 *
 * @param fn - a function that throws only PondusError (a {@link guarded} one).
 * @returns the same function returning a SafeResult.
 * @throws nothing: a PondusError, BAD_ARGUMENT included, becomes `{ success: false }`, and so does an error of another type from an unguarded `fn` (as INTERNAL_ERROR or DIVISION_BY_ZERO, see {@link toSafe}).
 * @example
 * const half = safely(guarded('half', (x) => x / 2, ['number']))
 * half(3) // { success: true, data: 1.5 }
 * half(null).success // false
 */
export function safely<A extends unknown[], R>(fn: (...args: A) => R): (...args: A) => SafeResult<R> {
  return (...args: A) => toSafe(() => fn(...args));
}
