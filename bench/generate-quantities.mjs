// Deterministic input mixes for the batch rows of the quantity commands (calc,
// balance, analysis, prepare, empirical, candidates): varied numbers, units and
// formulas, as a lab would pipe them, never one line repeated. Each generator
// takes the number of lines and a seed; the percents and masses that must be
// consistent with a formula are computed with the built library (`lib`).

const lcg = (seed) => {
  let s = seed >>> 0;
  return () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
};

function tools(seed) {
  const rnd = lcg(seed);
  const int = (a, b) => a + Math.floor(rnd() * (b - a + 1));
  const pick = (a) => a[int(0, a.length - 1)];
  // a measured number with 2–5 significant figures, written as a lab would (8.80, 250., 0.0340, 1.25e-3)
  const num = (lo, hi) => {
    const v = lo + rnd() * (hi - lo);
    const figs = int(2, 5);
    const k = rnd();
    if (k < 0.05) return v.toExponential(figs - 1);
    let t = v.toPrecision(figs);
    if (t.includes('e')) t = Number(t).toString();
    if (!t.includes('.') && k < 0.2) t += '.';
    return t;
  };
  return { rnd, int, pick, num };
}

const SALTS = [
  'NaCl', 'KCl', 'CuSO4·5H2O', 'CuSO4', 'MgSO4·7H2O', 'CaCl2·2H2O', 'Na2CO3', 'Na2CO3·10H2O', 'KH2PO4', 'K2HPO4',
  'NaH2PO4·H2O', 'Na2HPO4·7H2O', 'NH4Cl', '(NH4)2SO4', 'FeSO4·7H2O', 'FeCl3·6H2O', 'ZnSO4·7H2O', 'MnCl2·4H2O',
  'CoCl2·6H2O', 'NiSO4·6H2O', 'AgNO3', 'KNO3', 'NaNO3', 'Ca(NO3)2·4H2O', 'KMnO4', 'K2Cr2O7', 'NaOH', 'KOH',
  'Na2S2O3·5H2O', 'C10H14N2Na2O8·2H2O', 'C6H12O6', 'C12H22O11', 'C6H8O7·H2O', 'C4H11NO3', 'NaHCO3', 'BaCl2·2H2O',
  'Pb(NO3)2', 'KI', 'KBr', 'NaF', 'LiCl', 'SrCl2·6H2O', 'Al2(SO4)3·18H2O', 'KAl(SO4)2·12H2O', 'H2C2O4·2H2O',
];

const MASS_UNITS = ['g', 'mg', 'kg', 'µg', 'ug'];
const VOLUME_UNITS = ['mL', 'L', 'µL', 'mL', 'mL'];
const CONC_UNITS = ['M', 'mM', 'mol/L', 'g/L', 'mg/mL', 'µM'];

/** One calculator expression a line: molar masses, unit conversions, dilutions, percents, ± uncertainties. */
export function* generateCalc(n, seed = 4242) {
  const { int, pick, num } = tools(seed);
  const forms = [
    () => `${num(0.01, 2)} M * ${num(1, 500)} mL * M(${pick(SALTS)}) to g`,
    () => `${num(0.1, 50)} g / M(${pick(SALTS)})`,
    () => `${num(0.1, 50)} g / M(${pick(SALTS)}) to mmol`,
    () => `${num(1, 99)} g / ${num(1, 500)} mL`,
    () => `${num(0.1, 10)} g / ${num(5, 50)} g * 100 %`,
    () => `${num(0.01, 5)} ${pick(MASS_UNITS)} + ${num(0.01, 5)} ${pick(MASS_UNITS)}`,
    () => `${num(10, 900)} ${pick(MASS_UNITS)} - ${num(0.1, 9)} ${pick(MASS_UNITS)}`,
    () => `${num(0.05, 2)} M * ${num(1, 50)} mL / ${num(50, 1000)} mL`,
    () => `${num(1, 900)} mg to g`,
    () => `${num(0.5, 20)} ${pick(CONC_UNITS)} * ${num(1, 900)} ${pick(VOLUME_UNITS)}`,
    () => `${num(1, 20)} ± 0.0${int(1, 9)} g / ${num(10, 90)} ± 0.${int(1, 9)} mL`,
    () => `${num(1, 10)}^2 * ${int(2, 12)}`,
    () => `${int(1, 5)} * M(C${int(1, 30)}H${int(2, 60)}O${int(1, 8)}) / ${int(1, 4)}`,
  ];
  for (let i = 0; i < n; i++) yield pick(forms)();
}

/** Equations to balance: combustions of varied organics, acid–base, metals in acid, precipitations, redox with ions. */
export function* generateEquations(n, seed = 999) {
  const { int, pick } = tools(seed);
  const metals = ['Na', 'K', 'Li', 'Mg', 'Ca', 'Zn', 'Fe', 'Al', 'Ba', 'Sr'];
  const acids = ['HCl', 'HNO3', 'H2SO4', 'H3PO4', 'HBr'];
  const forms = [
    () => `C${int(1, 30)}H${int(2, 62)} + O2 -> CO2 + H2O`,
    () => {
      const c = int(2, 24);
      return `C${c}H${int(c, 2 * c + 2)}O${int(1, Math.min(8, c))} + O2 -> CO2 + H2O`;
    },
    () => `C${int(2, 20)}H${int(3, 40)}N${int(1, 4)}O${int(1, 6)} + O2 -> CO2 + H2O + N2`,
    () => `${pick(metals)} + ${pick(acids)} -> H2 + ?`,
    () => `${pick(['NaOH', 'KOH', 'Ca(OH)2', 'Ba(OH)2'])} + ${pick(acids)} -> H2O + ?`,
    () => pick(['Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O', 'Cr2O7^2- + Fe^2+ + H^+ -> Cr^3+ + Fe^3+ + H2O', 'Cu + NO3^- + H^+ -> Cu^2+ + NO + H2O', 'MnO4^- + C2O4^2- + H^+ -> Mn^2+ + CO2 + H2O', 'I^- + IO3^- + H^+ -> I2 + H2O']),
    () => pick(['AgNO3 + NaCl -> AgCl + NaNO3', 'BaCl2 + Na2SO4 -> BaSO4 + NaCl', 'Pb(NO3)2 + KI -> PbI2 + KNO3', 'Fe2O3 + CO -> Fe + CO2', 'Al + Fe2O3 -> Al2O3 + Fe', 'KClO3 -> KCl + O2', 'NH3 + O2 -> NO + H2O', 'Ca3(PO4)2 + SiO2 + C -> CaSiO3 + P4 + CO']),
  ];
  const salt = { HCl: 'Cl', HNO3: 'NO3', H2SO4: 'SO4', H3PO4: 'PO4', HBr: 'Br' };
  const charge = { Na: 1, K: 1, Li: 1, Mg: 2, Ca: 2, Zn: 2, Fe: 2, Al: 3, Ba: 2, Sr: 2 };
  const anionCharge = { Cl: 1, NO3: 1, SO4: 2, PO4: 3, Br: 1 };
  const saltOf = (cation, q, acid) => {
    const a = salt[acid];
    const z = anionCharge[a];
    const g = (x, y) => (y ? g(y, x % y) : x);
    const d = g(q, z);
    const nc = z / d;
    const na = q / d;
    const an = na === 1 ? a : a.length > 2 ? `(${a})${na}` : `${a}${na}`;
    return `${cation}${nc === 1 ? '' : nc}${an}`;
  };
  for (let i = 0; i < n; i++) {
    const f = pick(forms)();
    if (!f.includes('?')) yield f;
    else {
      const [lhs] = f.split(' -> ');
      const [base, acid] = lhs.split(' + ');
      const m = /^([A-Z][a-z]?)/.exec(base)[1];
      yield f.replace('?', saltOf(m, charge[m], acid));
    }
  }
}

const ORGANIC = (t) => {
  const { int, rnd } = t;
  let f = `C${int(4, 40)}H${int(4, 60)}`;
  if (rnd() < 0.7) f += `N${int(1, 6)}`;
  if (rnd() < 0.8) f += `O${int(1, 10)}`;
  if (rnd() < 0.15) f += `S${int(1, 2)}`;
  if (rnd() < 0.1) f += `Cl${int(1, 2)}`;
  return f;
};

/** Analysis lines 'FORMULA C=… H=… N=…': found values within about ±0.6 points of the calculated ones. */
export function* generateAnalysis(n, lib, seed = 3131) {
  const t = tools(seed);
  const { rnd, pick } = t;
  for (let i = 0; i < n; i++) {
    let f;
    let c;
    try {
      f = rnd() < 0.85 ? ORGANIC(t) : pick(['C6H12O6', 'C20H25N3O', 'C8H10N4O2', 'C9H8O4', 'C17H19NO3', 'C21H30O2', 'C10H16N2O3S']);
      c = lib.composition(f);
    } catch {
      i--;
      continue;
    }
    const found = c.elements.filter((e) => ['C', 'H', 'N', 'S'].includes(e.symbol)).map((e) => `${e.symbol}=${(e.massPercent + (rnd() - 0.5) * 1.2).toFixed(2)}`);
    yield `${f} ${found.join(rnd() < 0.5 ? ' ' : ',')}`;
  }
}

/** Reagents for prepare, one a line: salts and hydrates as they are in the bottle, with the options fixed. */
export function* generateReagents(n, seed = 5151) {
  const t = tools(seed);
  const { rnd, pick, int } = t;
  for (let i = 0; i < n; i++) {
    const k = rnd();
    if (k < 0.75) yield pick(SALTS);
    else if (k < 0.9) yield `C${int(2, 20)}H${int(4, 40)}O${int(1, 8)}`;
    else yield `${pick(['Na', 'K', 'Li', 'Cs', 'Rb'])}${pick(['Cl', 'Br', 'I', 'NO3', 'HCO3'])}`;
  }
}

/** Measurement sets for the empirical formula: mass percents (2 decimals) of varied C/H/N/O/S/Cl compounds, some with O by difference, some as element masses. */
export function* generateMeasurementSets(n, lib, seed = 6161) {
  const t = tools(seed);
  const { rnd, int } = t;
  for (let i = 0; i < n; i++) {
    // valence-plausible: H ≤ 2C + 2 + N − Cl, with an even sum of odd-valence atoms
    const C = int(1, 12);
    const N = rnd() < 0.4 ? int(1, 3) : 0;
    const O = rnd() < 0.8 ? int(1, 6) : 0;
    const S = rnd() < 0.1 ? int(1, 2) : 0;
    const Cl = rnd() < 0.1 ? int(1, 2) : 0;
    const hMax = 2 * C + 2 + N - Cl;
    let H = int(Math.max(1, C >> 1), Math.max(1, hMax));
    if ((H + N + Cl) % 2 === 1) H += H < hMax ? 1 : -1;
    if (H < 1) H = 2;
    const f = `C${C}H${H}${N ? `N${N}` : ''}${O ? `O${O}` : ''}${S ? `S${S}` : ''}${Cl ? `Cl${Cl}` : ''}`;
    let c;
    try {
      c = lib.composition(f);
    } catch {
      i--;
      continue;
    }
    const k = rnd();
    const parts = c.elements.map((e, j) => {
      if (k < 0.25 && j === c.elements.length - 1 && e.symbol === 'O') return 'O=rest';
      if (k > 0.85) return `${e.symbol}=${((e.massPercent / 100) * 2.5).toFixed(4)} g`;
      return `${e.symbol}=${e.massPercent.toFixed(2)}`;
    });
    if (k > 0.85) parts.push('sample=2.5000 g');
    yield parts.join(' ');
  }
}

/** Monoisotopic masses (5 decimals) of plausible organic formulas between about 150 and 900 Da. */
export function* generateMasses(n, lib, seed = 7171) {
  const t = tools(seed);
  const { rnd, int } = t;
  let made = 0;
  while (made < n) {
    let f = `C${int(8, 50)}H${int(8, 70)}`;
    if (rnd() < 0.7) f += `N${int(1, 6)}`;
    f += `O${int(1, 12)}`;
    if (rnd() < 0.2) f += `S${int(1, 2)}`;
    let m;
    try {
      m = lib.formulaMass(f).monoisotopicMass;
    } catch {
      continue;
    }
    if (m < 150 || m > 900) continue;
    made++;
    yield (m + (rnd() - 0.5) * m * 2e-6).toFixed(5);
  }
}
