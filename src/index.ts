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
// Every public function is guarded: it answers or throws a PondusError, never a TypeError (errors/guard.ts);
// every safe… function is derived from its throwing function by `safely`, so the two cannot drift.
import { guarded, safely } from './errors/guard.js';
export { PondusError, type SafeResult } from './errors/pondus-error.js';
import { toSafe as toSafe_ } from './errors/pondus-error.js';
export const toSafe = /* @__PURE__ */ guarded('toSafe', toSafe_, ['function']);
export { type RenderOptions } from './errors/render.js';
import { renderError as renderError_, errorJson as errorJson_ } from './errors/render.js';
export const renderError = /* @__PURE__ */ guarded('renderError', renderError_, ['error', 'options?']);
export const errorJson = /* @__PURE__ */ guarded('errorJson', errorJson_, ['error']);
export type { Issue, IssueCode, Note } from './errors/issue.js';

// exact decimals
export { Decimal } from './exact/decimal.js';

// formula language
export { type ParseOptions } from './formula-parser/parse.js';
import { parseFormula as parseFormula_ } from './formula-parser/parse.js';
export const parseFormula = /* @__PURE__ */ guarded('parseFormula', parseFormula_, ['text', 'options?']);
export const safeParseFormula = /* @__PURE__ */ safely(parseFormula);
export { ABBREVIATIONS, ABBREVIATION_CLASHES } from './formula-parser/abbreviations.js';
export type { FormulaTree, ComponentNode, PartNode, AtomNode, GroupNode, CountNode, Span } from './formula-parser/tree.js';
export { type AtomCounts, type AtomVector } from './formula/flatten.js';
import { flattenFormula as flattenFormula_, atomVector as atomVector_ } from './formula/flatten.js';
export const flattenFormula = /* @__PURE__ */ guarded('flattenFormula', flattenFormula_, ['parsed']);
export const atomVector = /* @__PURE__ */ guarded('atomVector', atomVector_, ['parsed']);
import { hillFormula as hillFormula_, hillOrder as hillOrder_ } from './formula/hill.js';
export const hillFormula = /* @__PURE__ */ guarded('hillFormula', hillFormula_, ['map', 'number?', 'array?']);
export const hillOrder = /* @__PURE__ */ guarded('hillOrder', hillOrder_, ['atomKeys']);
export type { Amount } from './formula/amount.js';
export { TABLE_VI_SEQUENCE, type WrittenOrderOptions } from './formula/written-order.js';
import { writtenOrder as writtenOrder_, writtenFormula as writtenFormula_ } from './formula/written-order.js';
export const writtenOrder = /* @__PURE__ */ guarded('writtenOrder', writtenOrder_, ['atomKeys', 'options?']);
export const writtenFormula = /* @__PURE__ */ guarded('writtenFormula', writtenFormula_, ['map', 'number?', 'options?']);

// element data
export { ELEMENTS, ATOMIC_WEIGHT_PROVENANCE, type ElementData, type StandardWeight } from './elements/element-table.js';
import { getElement as getElement_, isElementSymbol as isElementSymbol_ } from './elements/element-table.js';
export const getElement = /* @__PURE__ */ guarded('getElement', getElement_, ['text']);
export const isElementSymbol = /* @__PURE__ */ guarded('isElementSymbol', isElementSymbol_, ['any']);
export { NUCLIDE_PROVENANCE, type Nuclide, type NaturalIsotope } from './elements/nuclides.js';
import { getNuclide as getNuclide_, naturalIsotopes as naturalIsotopes_, principalIsotope as principalIsotope_ } from './elements/nuclides.js';
export const getNuclide = /* @__PURE__ */ guarded('getNuclide', getNuclide_, ['text', 'number']);
export const naturalIsotopes = /* @__PURE__ */ guarded('naturalIsotopes', naturalIsotopes_, ['text']);
export const principalIsotope = /* @__PURE__ */ guarded('principalIsotope', principalIsotope_, ['text']);
export { ELECTRON_MASS, CONSTANTS_PROVENANCE } from './elements/constants.js';
export type { WeightTable } from './elements/atom-data.js';

// molar mass
export { type MassOptions, type MassResult, type MassDetail, type Contribution } from './mass/formula-mass.js';
import { formulaMass as formulaMass_, formulaMassDetail as formulaMassDetail_, plainMass as plainMass_, molarMass as molarMass_ } from './mass/formula-mass.js';
export const formulaMass = /* @__PURE__ */ guarded('formulaMass', formulaMass_, ['tree', 'options?']);
export const formulaMassDetail = /* @__PURE__ */ guarded('formulaMassDetail', formulaMassDetail_, ['tree', 'options?']);
export const plainMass = /* @__PURE__ */ guarded('plainMass', plainMass_, ['massDetail']);
export const molarMass = /* @__PURE__ */ guarded('molarMass', molarMass_, ['tree', 'options?']);
export const safeFormulaMass = /* @__PURE__ */ safely(formulaMass);
import { reportedMolarMass as reportedMolarMass_ } from './mass/reported-mass.js';
export const reportedMolarMass = /* @__PURE__ */ guarded('reportedMolarMass', reportedMolarMass_, ['massDetail']);
export { MASS_COLUMNS, type MassJson, type NoteJson } from './mass/mass-json.js';
import { massJson as massJson_, massJsonLine as massJsonLine_, massCells as massCells_ } from './mass/mass-json.js';
export const massJson = /* @__PURE__ */ guarded('massJson', massJson_, ['massResult']);
export const massJsonLine = /* @__PURE__ */ guarded('massJsonLine', massJsonLine_, ['massResult', 'posint?']);
export const massCells = /* @__PURE__ */ guarded('massCells', massCells_, ['massResult']);

// composition
export { type CompositionResult, type CompositionDetail, type CompositionOptions, type ElementShare, type PartShareResult } from './composition/element-shares.js';
import { composition as composition_, compositionDetail as compositionDetail_ } from './composition/element-shares.js';
export const composition = /* @__PURE__ */ guarded('composition', composition_, ['tree', 'options?']);
export const compositionDetail = /* @__PURE__ */ guarded('compositionDetail', compositionDetail_, ['tree', 'options?']);
export const safeComposition = /* @__PURE__ */ safely(composition);
export { type PartShare } from './composition/part-share.js';
import { partShare as partShare_ } from './composition/part-share.js';
export const partShare = /* @__PURE__ */ guarded('partShare', partShare_, ['massDetail', 'text', 'options?']);
export { COMPOSITION_LONG_COLUMNS, type CompositionJson } from './composition/composition-json.js';
import { compositionJson as compositionJson_, compositionJsonLine as compositionJsonLine_, compositionCsvColumns as compositionCsvColumns_, compositionCsvRow as compositionCsvRow_, compositionCsvLongRows as compositionCsvLongRows_ } from './composition/composition-json.js';
export const compositionJson = /* @__PURE__ */ guarded('compositionJson', compositionJson_, ['compositionResult']);
export const compositionJsonLine = /* @__PURE__ */ guarded('compositionJsonLine', compositionJsonLine_, ['compositionResult', 'posint?']);
export const compositionCsvColumns = /* @__PURE__ */ guarded('compositionCsvColumns', compositionCsvColumns_, ['compositionResult[]', 'any']);
export const compositionCsvRow = /* @__PURE__ */ guarded('compositionCsvRow', compositionCsvRow_, ['compositionResult', 'text[]']);
export const compositionCsvLongRows = /* @__PURE__ */ guarded('compositionCsvLongRows', compositionCsvLongRows_, ['compositionResult', 'any']);

// measured numbers and significant figures
export { type Measured } from './sigfig/measured.js';
import { exact as exact_, times as times_, dividedBy as dividedBy_, plus as plus_, minus as minus_, sumMeasured as sumMeasured_, sigFigsOf as sigFigsOf_ } from './sigfig/measured.js';
export const exact = /* @__PURE__ */ guarded('exact', exact_, ['numeric']);
export const times = /* @__PURE__ */ guarded('times', times_, ['measured', 'measured']);
export const dividedBy = /* @__PURE__ */ guarded('dividedBy', dividedBy_, ['measured', 'measured']);
export const plus = /* @__PURE__ */ guarded('plus', plus_, ['measured', 'measured']);
export const minus = /* @__PURE__ */ guarded('minus', minus_, ['measured', 'measured']);
export const sumMeasured = /* @__PURE__ */ guarded('sumMeasured', sumMeasured_, ['measured[]']);
export const sigFigsOf = /* @__PURE__ */ guarded('sigFigsOf', sigFigsOf_, ['measured']);
export { type ReadNumber } from './sigfig/read-number.js';
import { readNumber as readNumber_ } from './sigfig/read-number.js';
export const readNumber = /* @__PURE__ */ guarded('readNumber', readNumber_, ['text', 'number?']);
export { type Display, type RoundingMode } from './sigfig/round.js';
import { roundToSigFigs as roundToSigFigs_, roundToPosition as roundToPosition_, displayMeasured as displayMeasured_ } from './sigfig/round.js';
export const roundToSigFigs = /* @__PURE__ */ guarded('roundToSigFigs', roundToSigFigs_, ['decimal', 'posint', 'rounding?']);
export const roundToPosition = /* @__PURE__ */ guarded('roundToPosition', roundToPosition_, ['decimal', 'number', 'rounding?']);
export const displayMeasured = /* @__PURE__ */ guarded('displayMeasured', displayMeasured_, ['measured', 'rounding?']);

// quantities, units and the calculator
export { type Quantity } from './sigfig/quantity.js';
import { quantity as quantity_, add as add_, subtract as subtract_, multiply as multiply_, divide as divide_, power as power_, negate as negate_, standardUncertainty as standardUncertainty_ } from './sigfig/quantity.js';
export const quantity = /* @__PURE__ */ guarded('quantity', quantity_, ['measured', 'unitObject|null']);
export const add = /* @__PURE__ */ guarded('add', add_, ['quantity', 'quantity', 'number?']);
export const subtract = /* @__PURE__ */ guarded('subtract', subtract_, ['quantity', 'quantity', 'number?']);
export const multiply = /* @__PURE__ */ guarded('multiply', multiply_, ['quantity', 'quantity']);
export const divide = /* @__PURE__ */ guarded('divide', divide_, ['quantity', 'quantity', 'number?']);
export const power = /* @__PURE__ */ guarded('power', power_, ['quantity', 'number']);
export const negate = /* @__PURE__ */ guarded('negate', negate_, ['quantity']);
export const standardUncertainty = /* @__PURE__ */ guarded('standardUncertainty', standardUncertainty_, ['quantity', 'map']);
export { UNIT_SYMBOLS, type Unit, type Dims } from './sigfig/units.js';
import { unitOf as unitOf_ } from './sigfig/units.js';
export const unitOf = /* @__PURE__ */ guarded('unitOf', unitOf_, ['text', 'number?']);
export { type CalcResult, type CalcOptions, type CalcJson } from './calc/calc.js';
import { calc as calc_, calcJson as calcJson_ } from './calc/calc.js';
export const calc = /* @__PURE__ */ guarded('calc', calc_, ['text', 'options?']);
export const calcJson = /* @__PURE__ */ guarded('calcJson', calcJson_, ['calcResult']);
export const safeCalc = /* @__PURE__ */ safely(calc);
import { parseExpression as parseExpression_ } from './calc/parse-expression.js';
export const parseExpression = /* @__PURE__ */ guarded('parseExpression', parseExpression_, ['text']);
export type { CalcStep } from './calc/evaluate.js';

// uncertainty of molar masses, mixtures
export { type MolarMassUncertainty, type UncertaintyTerm } from './mass/uncertainty.js';
import { molarMassUncertainty as molarMassUncertainty_, formatWithUncertainty as formatWithUncertainty_ } from './mass/uncertainty.js';
export const molarMassUncertainty = /* @__PURE__ */ guarded('molarMassUncertainty', molarMassUncertainty_, ['massDetail']);
export const formatWithUncertainty = /* @__PURE__ */ guarded('formatWithUncertainty', formatWithUncertainty_, ['decimal', 'decimal']);
export { type MixtureResult, type Share } from './composition/mixture.js';
import { mixtureComposition as mixtureComposition_, mixtureJson as mixtureJson_ } from './composition/mixture.js';
export const mixtureComposition = /* @__PURE__ */ guarded('mixtureComposition', mixtureComposition_, ['text', 'options?']);
export const mixtureJson = /* @__PURE__ */ guarded('mixtureJson', mixtureJson_, ['mixtureResult', 'rounding?']);
export const safeMixtureComposition = /* @__PURE__ */ safely(mixtureComposition);

// elemental analysis
export { type AnalysisResult, type AnalysisOptions, type Fit, type Partner } from './analysis/check.js';
import { analysis as analysis_ } from './analysis/check.js';
export const analysis = /* @__PURE__ */ guarded('analysis', analysis_, ['tree', 'text', 'options?']);
export const safeAnalysis = /* @__PURE__ */ safely(analysis);
import { analysisJson as analysisJson_ } from './analysis/analysis-json.js';
export const analysisJson = /* @__PURE__ */ guarded('analysisJson', analysisJson_, ['analysisResult', 'options?']);
import { readFound as readFound_ } from './analysis/found-values.js';
export const readFound = /* @__PURE__ */ guarded('readFound', readFound_, ['text']);
export { type SheetRow } from './analysis/lab-sheet.js';
import { readSheet as readSheet_ } from './analysis/lab-sheet.js';
export const readSheet = /* @__PURE__ */ guarded('readSheet', readSheet_, ['text']);
export { SOLVENTS } from './analysis/solvents.js';
import { solventByName as solventByName_ } from './analysis/solvents.js';
export const solventByName = /* @__PURE__ */ guarded('solventByName', solventByName_, ['text']);
export { PARTNER_PENALTY } from './analysis/solvate-fit.js';

// reactions
export { type BalanceResult, type BalanceOptions, type FixedCoefficients } from './reactions/balance.js';
import { balance as balance_, balanceParsed as balanceParsed_, equationText as equationText_ } from './reactions/balance.js';
export const balance = /* @__PURE__ */ guarded('balance', balance_, ['text', 'options?']);
export const balanceParsed = /* @__PURE__ */ guarded('balanceParsed', balanceParsed_, ['equation', 'options?']);
export const equationText = /* @__PURE__ */ guarded('equationText', equationText_, ['array', 'array', 'array']);
export const safeBalance = /* @__PURE__ */ safely(balance);
export { type BalanceJson } from './reactions/balance-json.js';
import { balanceJson as balanceJson_ } from './reactions/balance-json.js';
export const balanceJson = /* @__PURE__ */ guarded('balanceJson', balanceJson_, ['balanceResult']);
import { reactJson as reactJson_ } from './reactions/react-json.js';
export const reactJson = /* @__PURE__ */ guarded('reactJson', reactJson_, ['reactResult']);
import { readFixOption as readFixOption_ } from './reactions/fix-option.js';
export const readFixOption = /* @__PURE__ */ guarded('readFixOption', readFixOption_, ['text[]']);
export { TABLE_CAUTION, REAGENT_ROLES, type ReagentTable, type ReagentRow, type ReagentSpec, type ReagentRole, type ReagentTableOptions, type TableAmount } from './reagent-table/table.js';
import { reagentTable as reagentTable_, tableCautions as tableCautions_ } from './reagent-table/table.js';
export const reagentTable = /* @__PURE__ */ guarded('reagentTable', reagentTable_, ['array', 'options?']);
export const tableCautions = /* @__PURE__ */ guarded('tableCautions', tableCautions_, ['reagentRow[]']);
export const safeReagentTable = /* @__PURE__ */ safely(reagentTable);
export { type MaterialSpec, type Material } from './reagent-table/material.js';
import { readRowText as readRowText_ } from './reagent-table/row-text.js';
export const readRowText = /* @__PURE__ */ guarded('readRowText', readRowText_, ['text', 'text']);
export { PROCEDURE_COLUMNS, type Procedure, type ProcedureRow } from './reagent-table/procedure.js';
import { readProcedure as readProcedure_, writeProcedure as writeProcedure_ } from './reagent-table/procedure.js';
export const readProcedure = /* @__PURE__ */ guarded('readProcedure', readProcedure_, ['text']);
export const writeProcedure = /* @__PURE__ */ guarded('writeProcedure', writeProcedure_, ['array', 'options']);
export { type ReagentRowJson } from './reagent-table/reagent-table-json.js';
import { reagentRowJson as reagentRowJson_ } from './reagent-table/reagent-table-json.js';
export const reagentRowJson = /* @__PURE__ */ guarded('reagentRowJson', reagentRowJson_, ['reagentRow']);
export { COMMON_NAMES, type CommonName, type Hazard } from './reagent-table/names.js';
import { lookUpName as lookUpName_, hazardOf as hazardOf_ } from './reagent-table/names.js';
export const lookUpName = /* @__PURE__ */ guarded('lookUpName', lookUpName_, ['text']);
export const hazardOf = /* @__PURE__ */ guarded('hazardOf', hazardOf_, ['text', 'text']);
export { type Equation, type Species } from './reactions/equation.js';
import { parseEquation as parseEquation_ } from './reactions/equation.js';
export const parseEquation = /* @__PURE__ */ guarded('parseEquation', parseEquation_, ['text', 'options?']);
export { type ReactResult, type ReactOptions, type SpeciesLine } from './reactions/react.js';
import { react as react_ } from './reactions/react.js';
export const react = /* @__PURE__ */ guarded('react', react_, ['text', 'options']);
export const safeReact = /* @__PURE__ */ safely(react);
export { Rational } from './reactions/rational.js';
import { nullSpace as nullSpace_, smallestIntegers as smallestIntegers_ } from './reactions/rational.js';
export const nullSpace = /* @__PURE__ */ guarded('nullSpace', nullSpace_, ['array', 'number']);
export const smallestIntegers = /* @__PURE__ */ guarded('smallestIntegers', smallestIntegers_, ['array']);

// bench preparation
import { measure as measure_, measureAs as measureAs_ } from './calc/measure.js';
export const measure = /* @__PURE__ */ guarded('measure', measure_, ['text', 'text?', 'array?']);
export const measureAs = /* @__PURE__ */ guarded('measureAs', measureAs_, ['text', 'array', 'text', 'array?']);
export { type QuantityDisplay } from './sigfig/display-quantity.js';
import { displayQuantity as displayQuantity_, reportUnit as reportUnit_ } from './sigfig/display-quantity.js';
export const displayQuantity = /* @__PURE__ */ guarded('displayQuantity', displayQuantity_, ['quantity', 'unit|null?', 'rounding?']);
export const reportUnit = /* @__PURE__ */ guarded('reportUnit', reportUnit_, ['quantity', 'unit|null?']);
export { type SolutionResult, type SolutionOptions } from './preparation/solution.js';
import { prepareSolution as prepareSolution_ } from './preparation/solution.js';
export const prepareSolution = /* @__PURE__ */ guarded('prepareSolution', prepareSolution_, ['text', 'options']);
export const safePrepareSolution = /* @__PURE__ */ safely(prepareSolution);
export { type SubstituteResult } from './preparation/substitute.js';
import { substituteForm as substituteForm_ } from './preparation/substitute.js';
export const substituteForm = /* @__PURE__ */ guarded('substituteForm', substituteForm_, ['text', 'text', 'text', 'options?']);
export const safeSubstituteForm = /* @__PURE__ */ safely(substituteForm);
export { type DilutionResult } from './preparation/dilution.js';
import { dilute as dilute_ } from './preparation/dilution.js';
export const dilute = /* @__PURE__ */ guarded('dilute', dilute_, ['text', 'text|null?', 'text', 'text?']);
export const safeDilute = /* @__PURE__ */ safely(dilute);
export { type ConversionFactor } from './preparation/conversion-factor.js';
import { conversionFactor as conversionFactor_ } from './preparation/conversion-factor.js';
export const conversionFactor = /* @__PURE__ */ guarded('conversionFactor', conversionFactor_, ['text', 'text', 'text?', 'options?']);
export { type GravimetricResult, type GravimetricOptions } from './preparation/gravimetric.js';
import { gravimetric as gravimetric_ } from './preparation/gravimetric.js';
export const gravimetric = /* @__PURE__ */ guarded('gravimetric', gravimetric_, ['text', 'text', 'options?']);
export const safeGravimetric = /* @__PURE__ */ safely(gravimetric);
export { type SaltFactorResult } from './preparation/salt-factor.js';
import { saltFactor as saltFactor_ } from './preparation/salt-factor.js';
export const saltFactor = /* @__PURE__ */ guarded('saltFactor', saltFactor_, ['text', 'text', 'options?']);
export const safeSaltFactor = /* @__PURE__ */ safely(saltFactor);
export { BENCH_CAUTION, DOSE_CAUTION } from './preparation/caution.js';
export { type BasisResult, type BasisOptions } from './preparation/basis.js';
import { convertBasis as convertBasis_ } from './preparation/basis.js';
export const convertBasis = /* @__PURE__ */ guarded('convertBasis', convertBasis_, ['text', 'text', 'options?']);
export const safeConvertBasis = /* @__PURE__ */ safely(convertBasis);
export { WORKING_FIGURES, type Instruction, type AmountJson } from './sigfig/instruction.js';
import { displayInstruction as displayInstruction_, displayResult as displayResult_, instructionJson as instructionJson_, resultJson as resultJson_ } from './sigfig/instruction.js';
export const displayInstruction = /* @__PURE__ */ guarded('displayInstruction', displayInstruction_, ['instruction', 'unit|null?', 'rounding?']);
export const displayResult = /* @__PURE__ */ guarded('displayResult', displayResult_, ['quantity', 'unit|null?', 'rounding?']);
export const instructionJson = /* @__PURE__ */ guarded('instructionJson', instructionJson_, ['instruction', 'unit|null?', 'rounding?']);
export const resultJson = /* @__PURE__ */ guarded('resultJson', resultJson_, ['quantity', 'unit|null?', 'rounding?']);
export { type SaltForm, type MetalSaltReading } from './preparation/salt-factor.js';
export { CONCENTRATED_CAUTION } from './preparation/caution.js';
export { type ConcentratedResult, type ConcentratedOptions } from './preparation/concentrated.js';
import { concentratedReagent as concentratedReagent_ } from './preparation/concentrated.js';
export const concentratedReagent = /* @__PURE__ */ guarded('concentratedReagent', concentratedReagent_, ['text', 'options']);
export const safeConcentratedReagent = /* @__PURE__ */ safely(concentratedReagent);
export { CONCENTRATED_GRADES, type ConcentratedGrade } from './preparation/concentrated-grades.js';
export { MAX_SERIES_STEPS, type SeriesResult, type SeriesStep, type SeriesOptions } from './preparation/dilution-series.js';
import { dilutionSeries as dilutionSeries_, planSteps as planSteps_ } from './preparation/dilution-series.js';
export const dilutionSeries = /* @__PURE__ */ guarded('dilutionSeries', dilutionSeries_, ['options']);
export const planSteps = /* @__PURE__ */ guarded('planSteps', planSteps_, ['decimal', 'decimal']);
export const safeDilutionSeries = /* @__PURE__ */ safely(dilutionSeries);
export { type MassDilutionResult } from './preparation/mass-dilution.js';
import { diluteByMass as diluteByMass_ } from './preparation/mass-dilution.js';
export const diluteByMass = /* @__PURE__ */ guarded('diluteByMass', diluteByMass_, ['text', 'text', 'text']);
export const safeDiluteByMass = /* @__PURE__ */ safely(diluteByMass);
export { type PrepSheetRow, type PrepRowResult } from './preparation/prep-sheet.js';
import { readPrepSheet as readPrepSheet_, prepRow as prepRow_ } from './preparation/prep-sheet.js';
export const readPrepSheet = /* @__PURE__ */ guarded('readPrepSheet', readPrepSheet_, ['text']);
export const prepRow = /* @__PURE__ */ guarded('prepRow', prepRow_, ['object', 'options?']);
export const safePrepRow = /* @__PURE__ */ safely(prepRow);
export { MIN_WEIGHABLE_G, MIN_TRANSFER_L, MAX_ONE_STEP_FACTOR } from './preparation/warnings.js';

// formulas from measurements
export { type Measurements, type ElementMeasurement } from './empirical/measurements.js';
import { readMeasurements as readMeasurements_ } from './empirical/measurements.js';
export const readMeasurements = /* @__PURE__ */ guarded('readMeasurements', readMeasurements_, ['text']);
export { type FormulaFit, type SearchResult, MAX_SCALE } from './empirical/formula-search.js';
import { searchFormula as searchFormula_ } from './empirical/formula-search.js';
export const searchFormula = /* @__PURE__ */ guarded('searchFormula', searchFormula_, ['measurements', 'options?']);
export { type EmpiricalResult, type EmpiricalOptions } from './empirical/empirical-formula.js';
import { empirical as empirical_, empiricalJson as empiricalJson_ } from './empirical/empirical-formula.js';
export const empirical = /* @__PURE__ */ guarded('empirical', empirical_, ['text', 'options?']);
export const empiricalJson = /* @__PURE__ */ guarded('empiricalJson', empiricalJson_, ['empiricalResult']);
export const safeEmpirical = /* @__PURE__ */ safely(empirical);
export { PRODUCTS, type CombustionResult, type CombustionOptions, type CombustionElement } from './empirical/combustion.js';
import { combustion as combustion_ } from './empirical/combustion.js';
export const combustion = /* @__PURE__ */ guarded('combustion', combustion_, ['combustionOptions']);
export const safeCombustion = /* @__PURE__ */ safely(combustion);
export { DEFAULT_RANGES, RATIO_RANGES, MAX_VISITS, type Candidate, type CandidateResult, type CandidateOptions, type RatioRanges } from './empirical/candidates.js';
import { candidateFormulas as candidateFormulas_, candidateScore as candidateScore_, rdbe as rdbe_, readRanges as readRanges_ } from './empirical/candidates.js';
export const candidateScore = /* @__PURE__ */ guarded('candidateScore', candidateScore_, ['number|null', 'number', 'any', 'number', 'number|null?']);
export const candidateFormulas = /* @__PURE__ */ guarded('candidateFormulas', candidateFormulas_, ['options']);
export const rdbe = /* @__PURE__ */ guarded('rdbe', rdbe_, ['object']);
export const readRanges = /* @__PURE__ */ guarded('readRanges', readRanges_, ['text']);
export const safeCandidateFormulas = /* @__PURE__ */ safely(candidateFormulas);
import { candidatesJson as candidatesJson_ } from './empirical/candidates-json.js';
export const candidatesJson = /* @__PURE__ */ guarded('candidatesJson', candidatesJson_, ['candidateResult']);
export { type MeasuredPeak } from './empirical/pattern-match.js';
import { patternSimilarity as patternSimilarity_, readPeaks as readPeaks_ } from './empirical/pattern-match.js';
export const patternSimilarity = /* @__PURE__ */ guarded('patternSimilarity', patternSimilarity_, ['array', 'map', 'number', 'number']);
export const readPeaks = /* @__PURE__ */ guarded('readPeaks', readPeaks_, ['text']);
export { type MeasurementRow } from './empirical/measurement-sheet.js';
import { readMeasurementSheet as readMeasurementSheet_ } from './empirical/measurement-sheet.js';
export const readMeasurementSheet = /* @__PURE__ */ guarded('readMeasurementSheet', readMeasurementSheet_, ['text']);
export { type CsvSheet, type CsvRow } from './sheets/read-sheet.js';
import { readCsvSheet as readCsvSheet_, elementColumns as elementColumns_ } from './sheets/read-sheet.js';
export const readCsvSheet = /* @__PURE__ */ guarded('readCsvSheet', readCsvSheet_, ['text']);
export const elementColumns = /* @__PURE__ */ guarded('elementColumns', elementColumns_, ['text[]']);

// assay and QC
export { type TitrationAssayResult, type TitrationAssayOptions } from './assay/titration-assay.js';
import { titrationAssay as titrationAssay_ } from './assay/titration-assay.js';
export const titrationAssay = /* @__PURE__ */ guarded('titrationAssay', titrationAssay_, ['text', 'titrationOptions']);
export const safeTitrationAssay = /* @__PURE__ */ safely(titrationAssay);
export { type StandardiseResult, type StandardiseOptions } from './assay/standardise.js';
import { standardise as standardise_ } from './assay/standardise.js';
export const standardise = /* @__PURE__ */ guarded('standardise', standardise_, ['text', 'standardiseOptions']);
export const safeStandardise = /* @__PURE__ */ safely(standardise);
export { SAMPLE_BASES, type SampleBasis, type SampleContent, type BasisConversion } from './assay/sample-basis.js';
import { convertSampleBasis as convertSampleBasis_, readBasis as readBasis_, removedFraction as removedFraction_ } from './assay/sample-basis.js';
export const convertSampleBasis = /* @__PURE__ */ guarded('convertSampleBasis', convertSampleBasis_, ['any', 'text', 'text', 'object']);
export const readBasis = /* @__PURE__ */ guarded('readBasis', readBasis_, ['text']);
export const removedFraction = /* @__PURE__ */ guarded('removedFraction', removedFraction_, ['text', 'object', 'array']);
export const safeConvertSampleBasis = /* @__PURE__ */ safely(convertSampleBasis);
export { type Limits, type SpecificationCheck } from './assay/specification.js';
import { checkSpecification as checkSpecification_, readLimits as readLimits_ } from './assay/specification.js';
export const checkSpecification = /* @__PURE__ */ guarded('checkSpecification', checkSpecification_, ['quantity', 'text', 'rounding?', 'text?']);
export const readLimits = /* @__PURE__ */ guarded('readLimits', readLimits_, ['text']);
export { MAX_REPLICATES, type ReplicateResult, type ReplicateOptions } from './assay/replicates.js';
import { replicates as replicates_, splitValues as splitValues_ } from './assay/replicates.js';
export const replicates = /* @__PURE__ */ guarded('replicates', replicates_, ['text', 'options?']);
export const splitValues = /* @__PURE__ */ guarded('splitValues', splitValues_, ['text', 'array']);
export const safeReplicates = /* @__PURE__ */ safely(replicates);
import { tCritical as tCritical_, twoSidedP as twoSidedP_, incompleteBeta as incompleteBeta_, logGamma as logGamma_ } from './assay/student-t.js';
export const tCritical = /* @__PURE__ */ guarded('tCritical', tCritical_, ['number', 'number']);
export const twoSidedP = /* @__PURE__ */ guarded('twoSidedP', twoSidedP_, ['number', 'number']);
export const incompleteBeta = /* @__PURE__ */ guarded('incompleteBeta', incompleteBeta_, ['number', 'number', 'number']);
export const logGamma = /* @__PURE__ */ guarded('logGamma', logGamma_, ['number']);
export { type MoleRatio } from './assay/stoichiometric-ratio.js';
import { readMoleRatio as readMoleRatio_ } from './assay/stoichiometric-ratio.js';
export const readMoleRatio = /* @__PURE__ */ guarded('readMoleRatio', readMoleRatio_, ['text?', 'text', 'text', 'array', 'text?']);
import { hydrateWater as hydrateWater_ } from './assay/hydrate-note.js';
export const hydrateWater = /* @__PURE__ */ guarded('hydrateWater', hydrateWater_, ['massDetail']);
export { QC_CAUTION } from './assay/caution.js';

// compounding pharmacy
export { type MilliequivalentResult, type MilliequivalentOptions, type IonAmount } from './pharmacy/milliequivalents.js';
import { milliequivalents as milliequivalents_, readEquivalents as readEquivalents_ } from './pharmacy/milliequivalents.js';
export const milliequivalents = /* @__PURE__ */ guarded('milliequivalents', milliequivalents_, ['text', 'options']);
export const readEquivalents = /* @__PURE__ */ guarded('readEquivalents', readEquivalents_, ['text', 'array']);
export const safeMilliequivalents = /* @__PURE__ */ safely(milliequivalents);
export { MAX_COMPONENTS, type OsmolarityResult, type OsmolarityOptions, type IonTotal } from './pharmacy/osmolarity.js';
import { osmolarity as osmolarity_ } from './pharmacy/osmolarity.js';
export const osmolarity = /* @__PURE__ */ guarded('osmolarity', osmolarity_, ['text', 'options?']);
export const safeOsmolarity = /* @__PURE__ */ safely(osmolarity);
export { type AlligationResult, type AlligationOptions } from './pharmacy/alligation.js';
import { alligation as alligation_ } from './pharmacy/alligation.js';
export const alligation = /* @__PURE__ */ guarded('alligation', alligation_, ['text', 'options']);
export const safeAlligation = /* @__PURE__ */ safely(alligation);
export { type SaltIons, type SaltIon } from './pharmacy/salt-ions.js';
import { saltIons as saltIons_ } from './pharmacy/salt-ions.js';
export const saltIons = /* @__PURE__ */ guarded('saltIons', saltIons_, ['object', 'text?', 'array', 'options?']);
export { CATIONS, ANIONS, type IonEntry } from './pharmacy/ions.js';
export { type Strength, type PercentKind } from './pharmacy/strength.js';
import { readStrength as readStrength_ } from './pharmacy/strength.js';
export const readStrength = /* @__PURE__ */ guarded('readStrength', readStrength_, ['text', 'text', 'array', 'text']);
import { atWorkingPrecision as atWorkingPrecision_, noteFewFigures as noteFewFigures_ } from './pharmacy/working-precision.js';
export const atWorkingPrecision = /* @__PURE__ */ guarded('atWorkingPrecision', atWorkingPrecision_, ['quantity']);
export const noteFewFigures = /* @__PURE__ */ guarded('noteFewFigures', noteFewFigures_, ['quantity', 'text', 'text', 'array']);
export { PHARMACY_CAUTION } from './pharmacy/caution.js';
export { POTENCY_CAUTION } from './pharmacy/caution.js';
export { type PotencyResult, type PotencyOptions } from './pharmacy/potency.js';
import { potency as potency_ } from './pharmacy/potency.js';
export const potency = /* @__PURE__ */ guarded('potency', potency_, ['text', 'options?']);
export const safePotency = /* @__PURE__ */ safely(potency);
export { type StrengthForms } from './pharmacy/ratio-strength.js';
import { strengthForms as strengthForms_ } from './pharmacy/ratio-strength.js';
export const strengthForms = /* @__PURE__ */ guarded('strengthForms', strengthForms_, ['text']);
export const safeStrengthForms = /* @__PURE__ */ safely(strengthForms);
// ions and isotope patterns
import { readIonNotation as readIonNotation_, isIonNotation as isIonNotation_ } from './ions/read-ion-notation.js';
export const readIonNotation = /* @__PURE__ */ guarded('readIonNotation', readIonNotation_, ['text']);
export const isIonNotation = /* @__PURE__ */ guarded('isIonNotation', isIonNotation_, ['text']);
export type { IonNotation, IonTerm } from './ions/ion-notation.js';
export { type IonResult, type IonOptions, type IonError } from './ions/ion-mass.js';
import { ionMass as ionMass_ } from './ions/ion-mass.js';
export const ionMass = /* @__PURE__ */ guarded('ionMass', ionMass_, ['tree|null', 'notation|null', 'options?']);
export const safeIonMass = /* @__PURE__ */ safely(ionMass);
export { type MassError } from './ions/mass-error.js';
import { massError as massError_ } from './ions/mass-error.js';
export const massError = /* @__PURE__ */ guarded('massError', massError_, ['text', 'decimal', 'number?']);
export { type HrmsLineParts } from './ions/hrms-line.js';
import { hrmsLine as hrmsLine_ } from './ions/hrms-line.js';
export const hrmsLine = /* @__PURE__ */ guarded('hrmsLine', hrmsLine_, ['object']);
export { type IonJson } from './ions/ion-json.js';
import { ionJson as ionJson_ } from './ions/ion-json.js';
export const ionJson = /* @__PURE__ */ guarded('ionJson', ionJson_, ['object', 'options?']);
export { type IonLine } from './ions/read-ion-line.js';
import { readIonLine as readIonLine_ } from './ions/read-ion-line.js';
export const readIonLine = /* @__PURE__ */ guarded('readIonLine', readIonLine_, ['text']);
export { type IonSheetRow } from './ions/ion-sheet.js';
import { readIonSheet as readIonSheet_ } from './ions/ion-sheet.js';
export const readIonSheet = /* @__PURE__ */ guarded('readIonSheet', readIonSheet_, ['text']);
export { USUAL_CHARGE } from './ions/usual-charges.js';
export { type PatternResult, type PatternOptions, type PatternPeak } from './isotope-pattern/pattern.js';
import { isotopePattern as isotopePattern_ } from './isotope-pattern/pattern.js';
export const isotopePattern = /* @__PURE__ */ guarded('isotopePattern', isotopePattern_, ['tree|null', 'options?']);
export const safeIsotopePattern = /* @__PURE__ */ safely(isotopePattern);
export { type PatternJson } from './isotope-pattern/pattern-json.js';
import { patternJson as patternJson_ } from './isotope-pattern/pattern-json.js';
export const patternJson = /* @__PURE__ */ guarded('patternJson', patternJson_, ['patternResult', 'options?']);
export { type SvgOptions } from './isotope-pattern/pattern-svg.js';
import { patternSvg as patternSvg_ } from './isotope-pattern/pattern-svg.js';
export const patternSvg = /* @__PURE__ */ guarded('patternSvg', patternSvg_, ['patternResult', 'options?']);
export { type StickPlotOptions } from './isotope-pattern/stick-plot.js';
import { stickPlot as stickPlot_ } from './isotope-pattern/stick-plot.js';
export const stickPlot = /* @__PURE__ */ guarded('stickPlot', stickPlot_, ['peak[]', 'options?']);
export { type Stick } from './isotope-pattern/resolve-peaks.js';
import { resolvePeaks as resolvePeaks_ } from './isotope-pattern/resolve-peaks.js';
export const resolvePeaks = /* @__PURE__ */ guarded('resolvePeaks', resolvePeaks_, ['array', 'number']);
export { MAX_ISOTOPOLOGUES, type FineStructure, type Isotopologue } from './isotope-pattern/fine-structure.js';
import { fineStructure as fineStructure_ } from './isotope-pattern/fine-structure.js';
export const fineStructure = /* @__PURE__ */ guarded('fineStructure', fineStructure_, ['map', 'number', 'text?']);
export { MAX_BINS, type NominalDistribution } from './isotope-pattern/aggregated.js';
import { aggregatedDistribution as aggregatedDistribution_ } from './isotope-pattern/aggregated.js';
export const aggregatedDistribution = /* @__PURE__ */ guarded('aggregatedDistribution', aggregatedDistribution_, ['map', 'text?']);
export { type AtomIsotopes } from './isotope-pattern/isotope-table.js';
import { atomIsotopes as atomIsotopes_, isotopeAverage as isotopeAverage_ } from './isotope-pattern/isotope-table.js';
export const atomIsotopes = /* @__PURE__ */ guarded('atomIsotopes', atomIsotopes_, ['isotopeKey']);
export const isotopeAverage = /* @__PURE__ */ guarded('isotopeAverage', isotopeAverage_, ['atomIsotopes']);
