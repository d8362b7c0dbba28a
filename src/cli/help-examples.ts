/**
 * The examples that end every command's `--help`: two or three real command lines each, run by
 * the tests (each must exit 0). Kept in one place so that every command has them and they are
 * checked together; the data in them are demonstration values of our own.
 */
import type { Command } from 'commander';

/**
 * The examples of every command, made when asked for: a run that prints no help never makes
 * them, and its start-up does not add their texts to V8's table of strings.
 *
 * @example
 * helpExamples().mass[0] // "pondus mass 'CuSO4·5H2O' 'NH4^+' '[13C]H4'"
 */
export function helpExamples(): Readonly<Record<string, readonly string[]>> {
  return (made ??= examples());
}
let made: Readonly<Record<string, readonly string[]>> | undefined;

/** The examples of every command, by its name. */
export const HELP_EXAMPLES: Readonly<Record<string, readonly string[]>> = /* @__PURE__ */ helpExamples();

function examples(): Readonly<Record<string, readonly string[]>> {
  return {
    mass: ["pondus mass 'CuSO4·5H2O' 'NH4^+' '[13C]H4'", 'pondus mass --json C6H12O6 NaCl', 'pondus mass --uncertainty H2O'],
    composition: ["pondus composition 'CuSO4·5H2O'", "pondus composition --part H2O 'CuSO4·5H2O'", "pondus composition --mixture 'C=7.34 g, H=1.85 g, N=2.85 g'"],
    calc: ["pondus calc '5.63 g / 8.80 g * 100 %'", "pondus calc --explain '0.100 M * 250.0 mL * M(CuSO4·5H2O) to g'"],
    analysis: ['pondus analysis C20H25N3O --found C=72.30,H=7.91,N=12.60', 'pondus analysis C20H25N3O --found C=72.30,H=7.91,N=12.60 --solvents water,DCM,EtOAc'],
    empirical: ['pondus empirical C=40.00 H=6.71 O=53.29', "pondus empirical 'C=40.00 H=6.71 O=53.29' --molar-mass 180.16", "pondus empirical 'SiO2=42.70 MgO=57.30'"],
    combustion: ["pondus combustion '1.000 g' --co2 '1.499 g' --h2o '0.4091 g'", "pondus combustion --json '1.000 g' --co2 '1.499 g' --h2o '0.4091 g'"],
    candidates: ['pondus candidates 180.06339 --ppm 3', 'pondus candidates 323.19976 --ppm 3 --found C=74.27,H=7.79,N=12.99'],
    balance: ["pondus balance 'C3H8 + O2 -> CO2 + H2O'", "pondus balance 'Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O'"],
    react: ["pondus react 'H2 + O2 -> H2O' --amount 'H2=4.00 g' --amount 'O2=16.0 g'", "pondus react 'Si + N2 -> Si3N4' --amount 'Si=2.00 g' --amount 'N2=1.50 g'"],
    reagents: ["pondus reagents --reference 'C7H6O3=2.00 g' --reagent 'C4H6O3=3.0 equiv, density=1.08 g/mL' --catalyst 'H2SO4=5 mol %' --product 'C9H8O4' --actual '2.10 g'", "pondus reagents --procedure examples/organolithium-coupling.csv --markdown"],
    potency: ["pondus potency '950. µg/mg' --need '500. mg'", "pondus potency '101.2 %' --basis anhydrous --water '4.8 %' --need '250.0 mg'"],
    strength: ["pondus strength 1:1000 1:750", "pondus strength '0.02 % w/v' '12 mg/dL'"],
    prepare: ["pondus prepare NaCl --concentration '0.100 M' --volume '250.0 mL'", "pondus prepare 'CuSO4·5H2O' --concentration '0.100 M' --volume '250.0 mL' --purity '98.5 %'"],
    dilute: ["pondus dilute '1.00 M' --to '0.100 M' --volume '250.0 mL'", "pondus dilute '1.00 M' --taken '25.00 mL' --volume '250.0 mL'"],
    gravimetric: ['pondus gravimetric Fe --weighed Fe2O3', "pondus gravimetric Cl --weighed AgCl --mass '0.2866 g' --sample '0.5000 g'"],
    basis: ['pondus basis P2O5 --to P', "pondus basis K2O --to K --value '12.5 %'"],
    salt: ["pondus salt 'C17H19NO3·HCl·3H2O' --parent C17H19NO3", "pondus salt 'C17H19NO3·HCl·3H2O' --parent C17H19NO3 --dose '10.0 mg'"],
    titration: [
      "pondus titration KHC8H4O4 --sample '0.5000 g' --titrant '0.1000 M' --volume '24.40 mL'",
      "pondus titration C9H8O4 --sample '0.4985 g' --titrant '0.1002 M' --volume '27.45 mL' --blank '0.05 mL'",
    ],
    standardise: ["pondus standardise KHC8H4O4 --mass '0.5105 g' --volume '24.95 mL'", "pondus standardise Na2CO3 --mass '0.2500 g' --volume '23.40 mL' --ratio 1:2"],
    'sample-basis': ["pondus sample-basis '99.1 %' --to dried --loss '0.50 %'", "pondus sample-basis '98.7 %' --to anhydrous --water '0.32 %'"],
    replicates: ["pondus replicates '99.42 99.61 99.38 99.55 99.47 99.50 %'", "pondus replicates --json '3.080 3.094 3.107 3.056 3.112 g'"],
    meq: ["pondus meq KCl --meq '20 mEq'", "pondus meq KCl --concentration '10 %'"],
    osmolarity: ["pondus osmolarity 'NaCl=0.9 %'", "pondus osmolarity 'NaCl=0.45 %, KCl=0.15 %'", "pondus osmolarity 'C6H12O6·H2O=5 %, NaCl=0.45 %'"],
    alligation: ["pondus alligation '10 %' --higher '20 %' --lower '5 %' --total '300 g'", "pondus alligation '70 %' --higher '95 %' --lower '0 %' --total '500 mL'"],
    ion: ["pondus ion C15H15NO2 --adduct '[M+H]+' --found 242.1172", "pondus ion C6H12O6 --adduct '[M+Na]+'"],
    pattern: ['pondus pattern Br2', 'pondus pattern --json CH2Cl2'],
    completion: ['pondus completion bash > ~/.local/share/bash-completion/completions/pondus', 'pondus completion zsh > ~/.zfunc/_pondus', 'pondus completion fish > ~/.config/fish/completions/pondus.fish'],
    manual: ['pondus manual > pondus.1 && man ./pondus.1'],
  };
}

/**
 * Ends each command's `--help` with its examples (call after every command is registered).
 *
 * @example
 * addHelpExamples(program)
 */
export function addHelpExamples(program: Command): void {
  for (const cmd of program.commands) {
    // the text is made when the help is printed
    cmd.addHelpText('after', () => {
      const list = helpExamples()[cmd.name()];
      return list?.length ? `\nExamples:\n${list.map((e) => `  $ ${e}`).join('\n')}\n` : '';
    });
  }
}
