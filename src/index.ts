/**
 * pondus: quantitative chemistry for the bench, as a library.
 *
 * One curated public API. Every function that can fail on bad input throws a
 * {@link PondusError} (errors as data: codes, messages, columns); the `safe…`
 * variants return `{ success, data | error }` instead.
 *
 * @example
 * import { formulaMass, composition } from 'pondus';
 * formulaMass('CuSO4·5H2O').molarMass                                    // 249.677
 * composition('CuSO4·5H2O', { part: 'H2O' }).part?.massPercent.toFixed(2) // '36.08'
 */

// errors
export { PondusError, toSafe, type SafeResult } from './errors/pondus-error.js';
export { renderError, errorJson, type RenderOptions } from './errors/render.js';
export type { Issue, IssueCode, Note } from './errors/issue.js';

// exact decimals
export { Decimal } from './exact/decimal.js';

// formula language
export { parseFormula, safeParseFormula, type ParseOptions } from './formula-parser/parse.js';
export { ABBREVIATIONS, ABBREVIATION_CLASHES } from './formula-parser/abbreviations.js';
export type { FormulaTree, ComponentNode, PartNode, AtomNode, GroupNode, CountNode, Span } from './formula-parser/tree.js';
export { flattenFormula, atomVector, type AtomCounts, type AtomVector } from './formula/flatten.js';
export { hillFormula, hillOrder } from './formula/hill.js';
export type { Amount } from './formula/amount.js';

// element data
export { ELEMENTS, ATOMIC_WEIGHT_PROVENANCE, getElement, isElementSymbol, type ElementData, type StandardWeight } from './elements/element-table.js';
export { getNuclide, naturalIsotopes, principalIsotope, NUCLIDE_PROVENANCE, type Nuclide, type NaturalIsotope } from './elements/nuclides.js';
export { ELECTRON_MASS, CONSTANTS_PROVENANCE } from './elements/constants.js';
export type { WeightTable } from './elements/atom-data.js';

// molar mass
export { formulaMass, safeFormulaMass, formulaMassDetail, plainMass, molarMass, type MassOptions, type MassResult, type MassDetail, type Contribution } from './mass/formula-mass.js';
export { reportedMolarMass } from './mass/reported-mass.js';
export { massJson, massJsonLine, massCells, MASS_COLUMNS, type MassJson, type NoteJson } from './mass/mass-json.js';

// composition
export { composition, safeComposition, compositionDetail, type CompositionResult, type CompositionDetail, type CompositionOptions, type ElementShare, type PartShareResult } from './composition/element-shares.js';
export { partShare, type PartShare } from './composition/part-share.js';
export { compositionJson, compositionJsonLine, compositionCsvColumns, compositionCsvRow, compositionCsvLongRows, COMPOSITION_LONG_COLUMNS, type CompositionJson } from './composition/composition-json.js';

// measured numbers and significant figures
export { exact, times, dividedBy, plus, minus, sumMeasured, sigFigsOf, type Measured } from './sigfig/measured.js';
export { readNumber, type ReadNumber } from './sigfig/read-number.js';
export { roundToSigFigs, roundToPosition, displayMeasured, type Display, type RoundingMode } from './sigfig/round.js';

// quantities, units and the calculator
export { quantity, add, subtract, multiply, divide, power, negate, standardUncertainty, type Quantity } from './sigfig/quantity.js';
export { unitOf, UNIT_SYMBOLS, type Unit, type Dims } from './sigfig/units.js';
export { calc, safeCalc, calcJson, type CalcResult, type CalcOptions, type CalcJson } from './calc/calc.js';
export { parseExpression } from './calc/parse-expression.js';
export type { CalcStep } from './calc/evaluate.js';

// uncertainty of molar masses, mixtures
export { molarMassUncertainty, formatWithUncertainty, type MolarMassUncertainty, type UncertaintyTerm } from './mass/uncertainty.js';
export { mixtureComposition, safeMixtureComposition, mixtureJson, type MixtureResult, type Share } from './composition/mixture.js';

// elemental analysis
export { analysis, safeAnalysis, type AnalysisResult, type AnalysisOptions, type Fit, type Partner } from './analysis/check.js';
export { analysisJson } from './analysis/analysis-json.js';
export { readFound } from './analysis/found-values.js';
export { readSheet, type SheetRow } from './analysis/lab-sheet.js';
export { SOLVENTS, solventByName } from './analysis/solvents.js';
export { PARTNER_PENALTY } from './analysis/solvate-fit.js';

// reactions
export { balance, safeBalance, balanceJson, equationText, type BalanceResult } from './reactions/balance.js';
export { parseEquation, type Equation, type Species } from './reactions/equation.js';
export { react, safeReact, type ReactResult, type ReactOptions, type SpeciesLine } from './reactions/react.js';
export { Rational, nullSpace, smallestIntegers } from './reactions/rational.js';

// bench preparation
export { measure, measureAs } from './calc/measure.js';
export { displayQuantity, reportUnit, type QuantityDisplay } from './sigfig/display-quantity.js';
export { prepareSolution, safePrepareSolution, type SolutionResult, type SolutionOptions } from './preparation/solution.js';
export { substituteForm, safeSubstituteForm, type SubstituteResult } from './preparation/substitute.js';
export { dilute, safeDilute, type DilutionResult } from './preparation/dilution.js';
export { conversionFactor, type ConversionFactor } from './preparation/conversion-factor.js';
export { gravimetric, safeGravimetric, type GravimetricResult, type GravimetricOptions } from './preparation/gravimetric.js';
export { saltFactor, safeSaltFactor, type SaltFactorResult } from './preparation/salt-factor.js';
export { BENCH_CAUTION, DOSE_CAUTION } from './preparation/caution.js';
export { convertBasis, safeConvertBasis, type BasisResult, type BasisOptions } from './preparation/basis.js';
export { displayInstruction, displayResult, instructionJson, resultJson, WORKING_FIGURES, type Instruction, type AmountJson } from './sigfig/instruction.js';
export { MIN_WEIGHABLE_G, MIN_TRANSFER_L, MAX_ONE_STEP_FACTOR } from './preparation/warnings.js';

// formulas from measurements
export { readMeasurements, type Measurements, type ElementMeasurement } from './empirical/measurements.js';
export { searchFormula, type FormulaFit, type SearchResult, MAX_SCALE } from './empirical/formula-search.js';
export { empirical, safeEmpirical, empiricalJson, type EmpiricalResult, type EmpiricalOptions } from './empirical/empirical-formula.js';
export { combustion, safeCombustion, PRODUCTS, type CombustionResult, type CombustionOptions } from './empirical/combustion.js';
export { candidateFormulas, safeCandidateFormulas, rdbe, readRanges, DEFAULT_RANGES, type Candidate, type CandidateResult, type CandidateOptions } from './empirical/candidates.js';
export { readMeasurementSheet, type MeasurementRow } from './empirical/measurement-sheet.js';
export { readCsvSheet, elementColumns, type CsvSheet, type CsvRow } from './sheets/read-sheet.js';

// assay and QC
export { titrationAssay, safeTitrationAssay, type TitrationAssayResult, type TitrationAssayOptions } from './assay/titration-assay.js';
export { standardise, safeStandardise, type StandardiseResult, type StandardiseOptions } from './assay/standardise.js';
export { convertSampleBasis, safeConvertSampleBasis, readBasis, removedFraction, SAMPLE_BASES, type SampleBasis, type SampleContent, type BasisConversion } from './assay/sample-basis.js';
export { checkSpecification, readLimits, type Limits, type SpecificationCheck } from './assay/specification.js';
export { replicates, safeReplicates, splitValues, MAX_REPLICATES, type ReplicateResult, type ReplicateOptions } from './assay/replicates.js';
export { tCritical, twoSidedP, incompleteBeta, logGamma } from './assay/student-t.js';
export { readMoleRatio, type MoleRatio } from './assay/stoichiometric-ratio.js';
export { hydrateWater } from './assay/hydrate-note.js';
export { QC_CAUTION } from './assay/caution.js';

// compounding pharmacy
export { milliequivalents, safeMilliequivalents, readEquivalents, type MilliequivalentResult, type MilliequivalentOptions, type IonAmount } from './pharmacy/milliequivalents.js';
export { osmolarity, safeOsmolarity, MAX_COMPONENTS, type OsmolarityResult, type OsmolarityOptions, type IonTotal } from './pharmacy/osmolarity.js';
export { alligation, safeAlligation, type AlligationResult, type AlligationOptions } from './pharmacy/alligation.js';
export { saltIons, type SaltIons, type SaltIon } from './pharmacy/salt-ions.js';
export { CATIONS, ANIONS, type IonEntry } from './pharmacy/ions.js';
export { readStrength, type Strength, type PercentKind } from './pharmacy/strength.js';
export { atWorkingPrecision, noteFewFigures } from './pharmacy/working-precision.js';
export { PHARMACY_CAUTION } from './pharmacy/caution.js';
// ions and isotope patterns
export { readIonNotation, isIonNotation } from './ions/read-ion-notation.js';
export type { IonNotation, IonTerm } from './ions/ion-notation.js';
export { ionMass, safeIonMass, type IonResult, type IonOptions } from './ions/ion-mass.js';
export { massError, type MassError } from './ions/mass-error.js';
export { hrmsLine, type HrmsLineParts } from './ions/hrms-line.js';
export { ionJson, type IonJson } from './ions/ion-json.js';
export { readIonLine, type IonLine } from './ions/read-ion-line.js';
export { readIonSheet, type IonSheetRow } from './ions/ion-sheet.js';
export { USUAL_CHARGE } from './ions/usual-charges.js';
export { isotopePattern, safeIsotopePattern, type PatternResult, type PatternOptions, type PatternPeak } from './isotope-pattern/pattern.js';
export { patternJson, type PatternJson } from './isotope-pattern/pattern-json.js';
export { patternSvg, type SvgOptions } from './isotope-pattern/pattern-svg.js';
export { stickPlot, type StickPlotOptions } from './isotope-pattern/stick-plot.js';
export { resolvePeaks, type Stick } from './isotope-pattern/resolve-peaks.js';
export { fineStructure, MAX_ISOTOPOLOGUES, type FineStructure, type Isotopologue } from './isotope-pattern/fine-structure.js';
export { aggregatedDistribution, MAX_BINS, type NominalDistribution } from './isotope-pattern/aggregated.js';
export { atomIsotopes, isotopeAverage, type AtomIsotopes } from './isotope-pattern/isotope-table.js';
