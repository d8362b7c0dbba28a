/**
 * What every command is, without what it does: its name, description, arguments and options (with
 * their choices, defaults, conflicts and parsers). The help, the completion scripts and the manual
 * page are made from these alone, so `pondus --help` loads no chemistry; each command's own module
 * (commands/<name>.ts) attaches the action to the command declared here.
 *
 * Nothing here may import a computing module: the start-up of `--help` depends on it (the build
 * checks the help bundle's inputs).
 */
import { DEFAULT_RANGES, PRODUCTS } from '../../empirical/search-defaults.js';
import { Option, type Command } from 'commander';
import { conflicting, required, withFormulaOptions, withOutputOptions, withRoundingOption } from './common.js';

const ABBREVIATIONS_HELP = 'also read the abbreviations that need the reading settled: Ac (acetyl, OAc), Pr (propyl), Ts (tosyl) and reagent names such as THF, COD, TBS (Me, Et, Ph, Boc, Cp*, py and the like are read by default)';

/**
 * Which of a module's commands to declare: every one, or only `only` when it is one of them (a
 * command's own bundle declares just the command it runs, not its siblings' options).
 */
function wanted(names: readonly string[], only: string | undefined): (name: string) => boolean {
  const all = only === undefined || !names.includes(only);
  return (name) => all || name === only;
}

/** Collects the values of an option given more than once. */
const collect = (v: string, prev: string[] = []) => [...prev, v];

/**
 * Declares `pondus mass`.
 *
 * @example
 * declareMass(program).name() // 'mass'
 */
export function declareMass(program: Command): Command {
  return withRoundingOption(withFormulaOptions(
    program
      .command('mass')
      .description('molar mass, monoisotopic mass and nominal mass of formulas')
      .argument('[formulas...]', 'formulas; - reads one per line from standard input')
      .option('--uncertainty', 'also the standard uncertainty of the molar mass from the atomic-weight intervals'),
  ));
}

/**
 * Declares `pondus composition`.
 *
 * @example
 * declareComposition(program).name() // 'composition'
 */
export function declareComposition(program: Command): Command {
  const cmd = withRoundingOption(withFormulaOptions(
    program
      .command('composition')
      .description('percent by mass of each element, and of a fragment with --part')
      .argument('[formulas...]', 'formulas; - reads one per line from standard input')
      .option('--long', 'CSV/TSV: one row per element (input, formula, molarMass, symbol, count, mass, massPercent) instead of one X_percent column per element')
      .option('--part <fragment>', 'also the mass fraction of a fragment: H2O in a hydrate, SO4 in a salt, Fe in an iron salt')
      .option('--mixture', "inputs are measured masses, 'NaCl=5.00 g, KCl=3.00 g' or 'C=7.34 g H=1.85 g N=2.85 g' (unquoted NaCl=5.00 g KCl=3.00 g is one mixture): percent by component and by element"),
  ));
  conflicting(cmd, '--mixture', ['--part'], 'the share of a fragment is of one formula, and with --mixture the inputs are measured masses: drop one');
  return conflicting(cmd, '--mixture', ['--long'], '--long writes one CSV row per element of a formula; with --mixture drop --long');
}

/**
 * Declares `pondus calc`.
 *
 * @example
 * declareCalc(program).name() // 'calc'
 */
export function declareCalc(program: Command): Command {
  const cmd = withRoundingOption(withOutputOptions(
    program
      .command('calc')
      .description('calculate with measured quantities: significant figures, units, molar masses M(formula), ± uncertainties')
      .argument('[expressions...]', "expressions such as '0.100 M * 250.0 mL * M(CuSO4·5H2O) to g'; - reads one per line")
      .option('--explain', 'show each step and which input limited the precision'),
  ));
  return conflicting(cmd, '--explain', ['--csv', '--tsv'], 'the steps are shown in the table, and in JSON as `steps`');
}

/**
 * Declares `pondus analysis`.
 *
 * @example
 * declareAnalysis(program).name() // 'analysis'
 */
export function declareAnalysis(program: Command): Command {
  return withRoundingOption(withOutputOptions(
    program
      .command('analysis')
      .description('elemental analysis: calculated vs found, verdict at a tolerance, solvate fits, the report line')
      .argument('[formulas...]', "formulas; - reads one per line ('FORMULA' or 'FORMULA C=… H=… N=…')")
      .option('--found <values>', 'found mass percents, e.g. C=72.30,H=7.91,N=12.60 (unquoted --found C=72.30 H=7.91 N=12.60 works for one formula)')
      .option('--solvents <list>', 'solvents and salt partners to fit: water,DCM,CHCl3,MeOH,EtOH,EtOAc,ether,THF,acetone,MeCN,DMF,DMSO,toluene,hexane,HCl,TFA,… or formulas')
      .option('--tolerance <points>', 'allowed |found − calculated| in percentage points', '0.4')
      .option('--step <amount>', 'step of the solvate amounts searched', '0.05')
      .option('--max <amount>', 'largest amount of each solvate searched', '2')
      .option('--top <n>', 'how many fits to list', '5')
      .option('--abbreviations', ABBREVIATIONS_HELP)
      .addOption(new Option('--sheet <file>', 'a lab sheet (CSV: id, formula, and found % in columns C, H, N, S, …); - reads it from standard input')),
  ));
}

/** The combustion products `pondus combustion` takes a mass of, and the element each carries. */
export const COMBUSTION_PRODUCTS = PRODUCTS;

/** The default element ranges of `pondus candidates`. */
export const CANDIDATE_RANGES = DEFAULT_RANGES;

/**
 * Declares `pondus empirical`, `combustion` and `candidates`.
 *
 * @example
 * declareEmpirical(program).combustion?.name() // 'combustion'
 */
export function declareEmpirical(program: Command, only?: string): Partial<{ empirical: Command; combustion: Command; candidates: Command }> {
  const want = wanted(['empirical', 'combustion', 'candidates'], only);
  const empirical = !want('empirical') ? undefined : withOutputOptions(
    program
      .command('empirical')
      .description('empirical (and molecular) formula from mass percents or element masses')
      .argument('[measurements...]', "'C=40.00 H=6.71 O=53.29', 'Fe=34.97 g O=15.03 g', 'C=40.00 H=6.71 O=rest', oxides 'SiO2=42.70 MgO=57.30'; unquoted C=40.00 H=6.71 O=53.29 is one set; - reads one set per line (or a JSON object per line)")
      .option('--molar-mass <M>', 'molar mass in g/mol (searched within ±1 %, or a range such as 170-190): the molecular formula is searched directly')
      .option('--tolerance <points>', 'how far a calculated percent may be from the measured one, in percentage points (default 0.3, what combustion analysis is good to)')
      .option('--sheet <file>', "a CSV of measurements: element columns (C, H, N, …), optional id, 'sample' and 'molar mass' columns; - reads it from standard input"),
  );
  let combustion: Command | undefined;
  if (want('combustion')) {
    const combustionCmd = program
      .command('combustion')
      .description('combustion analysis: element percents and the empirical formula from the masses collected')
      .argument('[sample...]', "sample mass, e.g. '0.1000 g'");
    for (const [key, p] of Object.entries(COMBUSTION_PRODUCTS)) combustionCmd.option(`--${key} <mass>`, `mass of ${p.formula} collected (gives ${p.element})`);
    combustion = withRoundingOption(withOutputOptions(combustionCmd));
  }
  const candidates = !want('candidates') ? undefined : withOutputOptions(
    program
      .command('candidates')
      .description('candidate formulas for an accurate mass or m/z (or a molar mass), checked against found percents if given, any element, filtered for plausibility (RDBE, SENIOR, element ratios) and ranked by score')
      .argument('[masses...]', 'neutral monoisotopic masses in u, or m/z values with --ion (or molar masses with --molar-mass)')
      .option('--ppm <ppm>', 'mass tolerance in ppm', '5')
      .option('--ion <notation>', "the masses are m/z values of this ion: '[M+H]+', '[M+Na]+', '[M-H]-', '[M+2H]2+', …")
      .option('--pattern <peaks>', "a measured isotope pattern as m/z:intensity pairs, '203.0526:100 204.0560:6.9', scored against each candidate's")
      .option('--molar-mass', 'the masses are average molar masses (window ±0.5 g/mol)')
      .option('--found <values>', 'found percents to match too: C=64.85,H=5.44,N=6.30 (unquoted C=64.85 H=5.44 also works)')
      .option('--tolerance <points>', 'allowed |found − calculated| in percentage points', '0.4')
      .option('--elements <ranges>', 'element ranges, any element (e.g. add Fe0-1 B0-2 Si0-2 Na0-1)', CANDIDATE_RANGES)
      .option('--ratios <set>', 'element-ratio ranges of Kind & Fiehn 2007: extended (default), common, or none', 'extended')
      .option('--no-ratios', 'do not apply the element-ratio limits (as --ratios none)')
      .option('--limit <n>', 'most candidates to list', '50'),
  );
  if (candidates) conflicting(candidates, '--molar-mass', ['--ppm'], '--ppm sets the window of an accurate (monoisotopic) mass; with --molar-mass the window is ±0.5 g/mol: drop one');
  if (candidates) conflicting(candidates, '--molar-mass', ['--ion'], '--ion says the masses are m/z values of that ion; --molar-mass says they are average molar masses of the neutral compound: drop one');
  return { empirical, combustion, candidates };
}

/**
 * Declares `pondus balance`.
 *
 * @example
 * declareBalance(program).name() // 'balance'
 */
export function declareBalance(program: Command): Command {
  return withOutputOptions(
    program
      .command('balance')
      .description('balance chemical equations exactly (ions and electrons included); coefficients as written are used when they balance')
      .argument('[equations...]', "equations such as 'Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O'; - reads one per line")
      .option('--fix <coefficients>', "when atoms alone allow more than one balance: 'written' (the coefficients written in the equation) or SPECIES=N ('C4H6O3=5'; repeat or separate by commas)", collect)
      .option('--catalyst <species>', "a species written on one side that is a catalyst or additive, left out of the balance: 'H2SO4' (repeat for each; one written on both sides is read so by itself)", collect)
      .option('--abbreviations', ABBREVIATIONS_HELP),
  );
}

/**
 * Declares `pondus react`.
 *
 * @example
 * declareReact(program).name() // 'react'
 */
export function declareReact(program: Command): Command {
  return withRoundingOption(withOutputOptions(
    program
      .command('react')
      .description('limiting reagent, theoretical yield, excess left and percent yield of a reaction')
      .argument('[equations...]', 'equations (coefficients as written are used when they balance; balanced here if not); - reads one per line')
      .option('--amount <species=amount>', "an amount of a reactant: 'H2=4.00 g', 'O2=0.500 mol', 'HCl=25.0 mL of 0.100 M', 'Ac2O=2.00 mL, density=1.08 g/mL', 'Ac2O=1.5 equiv' (of the first reactant given by its own amount); purity= and solution= as in a reagent table (repeat for each)", collect)
      .option('--actual <species=amount>', "the amount of a product obtained, for percent yield: 'H2O=30.1 g'")
      .option('--fix <coefficients>', "when atoms alone allow more than one balance: 'written' or SPECIES=N ('C4H6O3=5')", collect)
      .option('--catalyst <species>', "a species written on one side that is a catalyst, left out of the balance: 'H2SO4' (its amount, if given with --amount, may be in mol %)", collect)
      .option('--abbreviations', ABBREVIATIONS_HELP),
  ));
}

/**
 * Declares `pondus reagents`.
 *
 * @example
 * declareReagents(program).name() // 'reagents'
 */
export function declareReagents(program: Command): Command {
  const cmd = withRoundingOption(withOutputOptions(
    program
      .command('reagents')
      .description('the reagent table of a synthesis: equivalents, mmol, mass to weigh, volume to take, solvent, theoretical and percent yield')
      .option('--reference <reagent=amount>', "the reference (limiting) reagent and its amount: 'C7H6O3=2.00 g', 'PhBr=5.00 mmol', 'PhCHO=1.02 mL, density=1.044 g/mL'")
      .option('--reagent <reagent=amount>', "a reagent by equivalents, mol % or its own amount, with purity=, density=, solution=, form= : 'Ac2O=3.0 equiv, density=1.08 g/mL', 'n-BuLi=1.1 equiv, solution=1.6 M in hexanes' (repeat for each)", collect)
      .option('--catalyst <reagent=amount>', "a catalyst, shown and left out of the stoichiometry: 'Pd(PPh3)4=2 mol %' (repeat for each)", collect)
      .option('--additive <reagent=amount>', 'an additive, shown and left out of the stoichiometry (repeat for each)', collect)
      .option('--product <reagent>', "the product, for the theoretical yield: 'C9H8O4', or 'aspirin, formula=C9H8O4' (repeat for each)", collect)
      .option('--equation <equation>', "the equation, for the product's coefficient per reference (1:1 when not given)")
      .option('--concentration <c>', "target concentration of the reference in the solvent: '0.2 M' (gives the solvent volume)")
      .option('--solvent <name>', "the solvent's name, for its row: 'THF' (with --concentration)")
      .option('--actual <amount>', "the amount of product obtained, for the percent yield: '2.10 g'")
      .addOption(new Option('--procedure <file>', 'a procedure file (CSV: role, reagent, formula, amount, purity, density, solution, form, actual, equation); - reads it from standard input'))
      .option('--markdown', 'a Markdown table, for electronic notebooks')
      .option('--abbreviations', 'also read the abbreviations that need the reading settled: Ac (acetyl, OAc), Pr (propyl), Ts (tosyl) and reagent names such as THF, COD, TBS'),
  ));
  return conflicting(cmd, '--markdown', ['--json', '--csv', '--tsv'], 'choose one output format');
}

/**
 * Declares `pondus prepare`.
 *
 * @example
 * declarePrepare(program).name() // 'prepare'
 */
export function declarePrepare(program: Command): Command {
  const cmd = withRoundingOption(
    withOutputOptions(
      program
        .command('prepare')
        .description('mass of a reagent to weigh for a solution (with assay and hydrate form), the concentration made from the mass weighed, or the mass to replace another form')
        .argument('[reagents...]', 'the reagent as it is in the bottle, e.g. CuSO4·5H2O; - reads one per line')
        .option('--concentration <c>', "target concentration: '0.100 M', '5.00 g/L', '1000 ppm' (mg/L), '2.0 %' (w/v)")
        .option('--volume <v>', "final volume: '250.0 mL'")
        .option('--purity <p>', "the assay of the reagent as weighed: '98.5 %' (with --replace: of the form in hand)")
        .addOption(new Option('--purity-basis <basis>', "what the assay is of: reagent (the reagent itself) or part (the content of the --as species, a potency 'as base')").choices(['reagent', 'part']))
        .option('--as <species>', 'the concentration is of this part of the reagent: Cu, Cl, CuSO4, a free base, …')
        .option('--weighed <m>', "the mass actually weighed: '1.4587 g'; gives the concentration made (a result)")
        .option('--fraction <w>', "a concentrated liquid reagent by its mass fraction: '37 %' (% w/w, as on the label); gives its molarity and the volume to take")
        .option('--density <d>', "density of the concentrated reagent: '1.19 g/mL' (from the label; common grades are in a table)")
        .option('--replace <form=amount>', "weigh this reagent in place of another form: --replace 'CuSO4=10.00 g'")
        .addOption(new Option('--weights <table>', 'atomic weights: standard (CIAAW 2021 + 2024 revisions) or abridged (five figures)').choices(['standard', 'abridged']).default('standard'))
        .option('--abbreviations', ABBREVIATIONS_HELP),
    ),
  );
  return cmd.option('--sheet <file>', 'a prep sheet: CSV with columns reagent, form, purity, density, target, volume (and id, as, weighed, taken): one instruction per row; - reads it from standard input');
}

/**
 * Declares `pondus dilute`, `gravimetric`, `basis` and `salt`.
 *
 * @example
 * declareConversions(program).salt?.name() // 'salt'
 */
export function declareConversions(program: Command, only?: string): Partial<{ dilute: Command; gravimetric: Command; basis: Command; salt: Command }> {
  const want = wanted(['dilute', 'gravimetric', 'basis', 'salt'], only);
  const dilute = !want('dilute') ? undefined : withRoundingOption(
    withOutputOptions(
      program
        .command('dilute')
        .description('dilution, C1·V1 = C2·V2: how much stock to take, or the concentration made from the volume taken')
        .argument('[stock...]', "stock concentration, e.g. '1.00 M' (with --series and no --to: the dilution factor, '1:1000')")
        .option('--to <c>', "target concentration, e.g. '0.100 M' (with --mass: the target content, '2.5 % w/w')")
        .option('--volume <v>', "final volume, e.g. '250.0 mL' (with --series: of each step)")
        .option('--taken <v>', "the volume of stock actually taken, e.g. '25.00 mL': gives the concentration made (a result)")
        .option('--series', 'plan a serial dilution: steps of at most 1:100, each transfer at least --min-transfer')
        .option('--min-transfer <v>', "smallest volume to pipette in a serial plan (default '100 µL')")
        .option('--max-step <n>', 'largest dilution factor of one step in a serial plan (default 100)')
        .option('--mass <m>', "dilute a solid or semisolid by mass to this total: --mass '60.0 g' (the input and --to in % w/w, mg/g, mg/kg)"),
    ),
  );
  const gravimetric = !want('gravimetric') ? undefined : withRoundingOption(
    withOutputOptions(
      program
        .command('gravimetric')
        .description('gravimetric factor (IUPAC Gold Book), analyte mass from the weighed form, and its mass fraction')
        .argument('[analytes...]', 'what is sought: Fe, Cl, SO4, P2O5, …')
        .option('--weighed <form>', 'the form weighed: Fe2O3, AgCl, BaSO4, Mg2P2O7, …')
        .option('--mass <m>', "mass of the weighed form: '0.2345 g'")
        .option('--sample <m>', "mass of the sample taken: '1.0012 g'")
        .option('--element <symbol>', 'the element the factor rests on, when the two share several'),
    ),
  );
  const basis = !want('basis') ? undefined : withRoundingOption(
    withOutputOptions(
      program
        .command('basis')
        .description('convert between an element and its oxide basis (P ↔ P2O5, K ↔ K2O, Si ↔ SiO2, …)')
        .argument('[from...]', 'the basis a value is given on: P2O5, K2O, SiO2, Al2O3, P, K, …')
        .option('--to <formula>', 'the basis to convert to')
        .option('--value <v>', "the value to convert: '12.5 %', '3.40 g'")
        .option('--element <symbol>', 'the element the conversion rests on, when the two share several'),
    ),
  );
  const salt = !want('salt') ? undefined : withRoundingOption(
    withOutputOptions(
      program
        .command('salt')
        .description('salt/parent factor of a salt form (parent·acid, or a sodium, potassium, calcium … salt with any hydrate), and masses either way')
        .argument('[salts...]', 'the salt: parent·acid for a basic drug (C17H19NO3·HCl·3H2O), or a metal salt of an acidic drug (C14H13NaO3, (C33H34FN2O5)2Ca·3H2O)')
        .option('--parent <formula>', 'the parent compound (free base or acid)')
        .option('--dose <m>', "a mass of parent: the salt mass that carries it, e.g. '10.0 mg' (an instruction, at working precision)")
        .option('--salt-mass <m>', 'a mass of salt: the parent mass it carries (a result)'),
    ),
  );
  if (gravimetric) required(gravimetric, '--weighed', 'give the formula of the weighed form (the precipitate or residue as weighed) with --weighed');
  if (basis) required(basis, '--to', 'give the basis to convert to: --to P (or --to P2O5, K2O, SiO2, …)');
  if (salt) required(salt, '--parent', 'give the formula of the parent compound (the free base or acid the dose is of) with --parent');
  return { dilute, gravimetric, basis, salt };
}

/** Adds the options that give a sample's content for a change of basis. */
function withBasisOptions(cmd: Command): Command {
  return cmd
    .option('--loss <p>', "loss on drying: '0.50 %'")
    .option('--water <p>', "water content (Karl Fischer): '0.32 %'")
    .option('--solvent <p>', "residual solvent: '0.10 %'")
    .option('--limits <range>', 'specification limits in %, checked on the reported basis: 98.0-102.0');
}

/**
 * Declares `pondus titration`, `standardise`, `sample-basis` and `replicates`.
 *
 * @example
 * declareQc(program).replicates?.name() // 'replicates'
 */
export function declareQc(program: Command, only?: string): Partial<{ titration: Command; standardise: Command; sampleBasis: Command; replicates: Command }> {
  const want = wanted(['titration', 'standardise', 'sample-basis', 'replicates'], only);
  const titration = !want('titration') ? undefined : withRoundingOption(
    withBasisOptions(
      withFormulaOptions(
        program
          .command('titration')
          .description('% assay of a sample by titration (direct, with a blank, or back-titration), on the as-is or another basis, checked against limits')
          .argument('[analytes...]', 'the analyte formula, e.g. C9H8O4; - reads one per line')
          .option('--sample <mass>', "mass of sample: '0.5012 g'")
          .option('--titrant <molarity>', "titrant molarity: '0.1000 M'")
          .option('--volume <v>', "titre: '24.85 mL'")
          .option('--blank <v>', 'blank titre: subtracted (direct); the reagent alone (with --back)')
          .option('--ratio <a:b>', 'mol analyte : mol titrant (direct) or : mol reagent (back-titration); 1:1 assumed with a note')
          .option('--added <amount>', "back-titration: excess reagent added, '50.00 mL of 0.5000 M'")
          .option('--reagent-ratio <a:b>', 'back-titration: mol reagent : mol titrant; 1:1 assumed with a note')
          .option('--back', 'back-titration against a blank (give --blank)'),
      ),
    ).option('--on <basis>', 'report on: as-is, dried, anhydrous, solvent-free, anhydrous-solvent-free'),
  );
  const standardise = !want('standardise') ? undefined : withRoundingOption(
    withFormulaOptions(
      program
        .command('standardise')
        .description('molarity of a titrant from a weighed primary standard (KHC8H4O4, Na2CO3, …)')
        .argument('[standards...]', 'the primary standard formula; - reads one per line')
        .option('--mass <m>', "mass of standard weighed: '0.5105 g'")
        .option('--volume <v>', "titre: '24.95 mL'")
        .option('--blank <v>', 'blank titre, subtracted')
        .option('--ratio <a:b>', 'mol standard : mol titrant (1:2 for Na2CO3 with HCl); 1:1 assumed with a note')
        .option('--purity <p>', "certified assay of the standard: '99.95 %'"),
    ),
  );
  const sampleBasis = !want('sample-basis') ? undefined : withRoundingOption(
    withBasisOptions(
      withOutputOptions(
        program
          .command('sample-basis')
          .description('a result (an assay %) on another basis of the sample: as is ↔ dried, anhydrous, solvent-free; optional check against limits')
          .argument('[results...]', "results such as '99.1 %'; - reads one per line")
          .option('--from <basis>', 'the basis the result is on (as-is unless given)')
          .option('--to <basis>', 'the basis wanted: dried, anhydrous, solvent-free, anhydrous-solvent-free, as-is'),
      ),
    ).option('--on <basis>', 'same as --to'),
  );
  const replicates = !want('replicates') ? undefined : withRoundingOption(
    withOutputOptions(
      program
        .command('replicates')
        .description('mean, standard deviation, RSD and Student-t confidence interval of replicate results, reported to fit the uncertainty')
        .argument('[lists...]', "one list per argument or line: '99.2 99.5 99.1 %'; - reads one list per line")
        .option('--level <percent>', 'confidence level: 90, 95 (default) or 99'),
    ),
  );
  if (titration) conflicting(titration, '--added', ['--blank'], 'a back-titration takes either --added (the excess reagent) or --blank (the titre of the reagent alone), not both');
  if (sampleBasis) conflicting(sampleBasis, '--on', ['--to'], '--to and --on say the same thing: give one');
  return { titration, standardise, sampleBasis, replicates };
}

/**
 * Declares `pondus meq`, `osmolarity`, `alligation`, `potency` and `strength`.
 *
 * @example
 * declarePharmacy(program).meq?.name() // 'meq'
 */
export function declarePharmacy(program: Command, only?: string): Partial<{ meq: Command; osmolarity: Command; alligation: Command; potency: Command; strength: Command }> {
  const want = wanted(['meq', 'osmolarity', 'alligation', 'potency', 'strength'], only);
  const meq = !want('meq') ? undefined : withRoundingOption(
    withFormulaOptions(
      program
        .command('meq')
        .description('mmol, mEq and mOsm of a salt: for a weighed mass, the mass for a target, or per mL of a strength')
        .argument('[salts...]', 'the salt, e.g. KCl, CaCl2·2H2O, K2HPO4; - reads one per line')
        .option('--mass <m>', "a weighed mass: '1.500 g'")
        .option('--meq <n>', "a target: '20 mEq' (gives the mass to weigh)")
        .option('--mmol <n>', "a target: '10 mmol' (gives the mass to weigh)")
        .option('--concentration <c>', "a strength: '10 % w/v', '84 g/L', '0.154 M', '2 mEq/mL' (gives mEq/mL, mEq/L, mOsm/L)")
        .option('--measured', 'the strength is measured (keep its significant figures), not a nominal label value')
        .option('--ions <list>', "the ions, when not read from the formula: '2K^+,HPO4^2-'"),
    ),
  );
  const osmolarity = !want('osmolarity') ? undefined : withRoundingOption(
    withFormulaOptions(
      program
        .command('osmolarity')
        .description('mOsm/L and mEq/L of a solution of salts (complete dissociation) and non-electrolytes such as dextrose (one particle per molecule)')
        .argument('[solutions...]', "solutes and strengths: 'NaCl=0.9 %', 'NaCl=0.6 %, KCl=0.03 %' or 'C6H12O6·H2O=5 %, NaCl=0.45 %'; a salt also in mEq: 'KCl=20 mEq/L'; - reads one solution per line")
        .option('--measured', 'the strengths are measured (keep their significant figures), not nominal label values'),
    ),
  );
  const alligation = !want('alligation') ? undefined : withRoundingOption(
    withOutputOptions(
      program
        .command('alligation')
        .description('amounts of a higher and a lower strength to mix for a target strength, by mass or by volume')
        .argument('[targets...]', "the target strength: '10 %'; - reads one per line")
        .option('--higher <s>', "the higher strength: '20 %'")
        .option('--lower <s>', "the lower strength, or '0 %' for a diluent or base")
        .option('--total <amount>', "the total to make: '300 g' (by mass) or '250 mL' (by volume)")
        .option('--by <how>', 'mass or volume, for parts only (no total)'),
    ),
  );
  const potency = !want('potency') ? undefined : withRoundingOption(
    withOutputOptions(
      program
        .command('potency')
        .description('potency of a drug substance as is (from µg/mg or %, as is or on the anhydrous or dried basis), and the mass of it that holds an amount of active')
        .argument('[potencies...]', "the potency from the certificate: '950 µg/mg', '98.7 %', '101.2 %' with --basis anhydrous; - reads one per line")
        .option('--basis <basis>', 'the basis the potency is given on: as-is (the default), anhydrous, dried, solvent-free')
        .option('--water <w>', "water content (Karl Fischer), for --basis anhydrous: '4.8 %'")
        .option('--loss <l>', "loss on drying, for --basis dried: '0.50 %'")
        .option('--solvent <s>', "residual solvent, for --basis solvent-free: '0.10 %'")
        .option('--need <m>', "the mass of active needed: '500 mg' (gives the mass to weigh)"),
    ),
  );
  const strength = !want('strength') ? undefined : withRoundingOption(
    withOutputOptions(
      program
        .command('strength')
        .description('a strength in each of its forms: ratio strength 1:N, % w/v, mg/mL, mg/dL; % w/w, mg/g, mg/kg; % v/v')
        .argument('[strengths...]', "'1:1000', '0.1 % w/v', '2.5 mg/mL', '0.5 % w/w', '1:750 w/w'; - reads one per line"),
    ),
  );
  return { meq, osmolarity, alligation, potency, strength };
}

/**
 * Declares `pondus ion` and `pattern`.
 *
 * @example
 * declareIon(program).pattern?.name() // 'pattern'
 */
export function declareIon(program: Command, only?: string): Partial<{ ion: Command; pattern: Command }> {
  const want = wanted(['ion', 'pattern'], only);
  const ion = !want('ion') ? undefined : withOutputOptions(
    program
      .command('ion')
      .description('m/z of an ion ([M+H]+, [M+Na]+, [M-H]-, [M+2H]2+, [2M+Na]+, M+•) with the electron mass, the error against a found m/z, the HRMS report line')
      .argument('[inputs...]', "formulas, or lines 'FORMULA ION [FOUND]' ('[C15H15NO2+H]+ 242.1172' also works); - reads one per line from standard input")
      .option('--adduct <ion>', "the ion, in the usual notation: '[M+H]+', '[M+Na]+', '[M-H]-', '[M+2H]2+', '[M+H-H2O]+', '[2M+Na]+', 'M+.'")
      .option('--found <m/z>', 'the measured m/z (one input only): gives the error in ppm and mDa and the report line')
      .option('--ionisation <method>', 'ionisation named in the report line', 'ESI')
      .option('--decimals <n>', 'decimals of the calculated m/z in the report line', '4')
      .option('--abbreviations', ABBREVIATIONS_HELP)
      .option('--sheet <file>', 'a lab sheet (CSV with columns id, formula, ion, found); - reads it from standard input'),
  );
  const pattern = !want('pattern') ? undefined : withOutputOptions(
    program
      .command('pattern')
      .description('isotope pattern of a formula or an ion: aggregated (nominal-mass peaks) or fine structure at a resolving power, as a terminal picture or SVG')
      .argument('[inputs...]', "formulas, or lines 'FORMULA [ION]'; - reads one per line from standard input")
      .option('--adduct <ion>', "the ion, in the usual notation: '[M+H]+', '[M+Na]+', '[M-H]-', '[M+2H]2+', 'M+.'")
      .option('--resolution <R>', 'fine structure as an instrument of resolving power R shows it (60000, or 60k): peaks closer than FWHM = m/R merge')
      .option('--fine', 'fine structure with every isotopologue apart')
      .option('--coverage <percent>', 'share of the probability the fine structure holds', undefined)
      .option('--min-relative <percent>', 'leave out peaks below this percentage of the largest', '0.1')
      .option('--svg <file>', 'also draw the pattern as an SVG picture (one input)')
      .option('--abbreviations', ABBREVIATIONS_HELP),
  );
  if (pattern) conflicting(pattern, '--fine', ['--resolution'], '--fine shows every isotopologue apart and --resolution merges them as an instrument would: choose one');
  return { ion, pattern };
}
