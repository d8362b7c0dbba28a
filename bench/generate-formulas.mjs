// Generates N distinct, realistic formulas (organic molecules, salts, hydrates,
// ions, condensed structural formulas), deterministically from a seed.
export function* generateFormulas(n, seed = 12345) {
  let s = seed >>> 0;
  const rnd = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
  const int = (a, b) => a + Math.floor(rnd() * (b - a + 1));
  const seen = new Set();
  const hetero = ['N', 'O', 'S', 'F', 'Cl', 'Br', 'P', 'I', 'Si', 'B'];
  const metals = ['Na', 'K', 'Li', 'Mg', 'Ca', 'Fe', 'Cu', 'Zn', 'Co', 'Ni', 'Mn', 'Cr', 'Al', 'Ba', 'Sr', 'Ag', 'Pd', 'Pt'];
  const anions = ['SO4', 'NO3', 'PO4', 'CO3', 'Cl', 'Br', 'OH', 'ClO4', 'C2O4', 'CH3COO'];
  let made = 0;
  while (made < n) {
    const kind = rnd();
    let f;
    if (kind < 0.6) {
      f = `C${int(1, 60)}`;
      const h = int(0, 120);
      if (h > 0) f += `H${h}`;
      const k = int(0, 4);
      for (let i = 0; i < k; i++) f += `${hetero[int(0, hetero.length - 1)]}${int(1, 9)}`;
    } else if (kind < 0.75) {
      const m = metals[int(0, metals.length - 1)];
      const a = anions[int(0, anions.length - 1)];
      f = `${m}${int(1, 3)}(${a})${int(1, 4)}`;
      if (rnd() < 0.5) f += `·${int(1, 12)}H2O`;
    } else if (kind < 0.9) {
      f = `CH3(CH2)${int(1, 40)}${['COOH', 'OH', 'NH2', 'CH3', 'Cl', 'SH'][int(0, 5)]}`;
    } else {
      f = `[${metals[int(0, metals.length - 1)]}(NH3)${int(1, 6)}]${['Cl', 'Br', '(NO3)'][int(0, 2)]}${int(1, 3)}`;
    }
    if (seen.has(f)) continue;
    seen.add(f);
    made++;
    yield f;
  }
}

const SUB = '₀₁₂₃₄₅₆₇₈₉';
const sub = (n) => String(n).replace(/[0-9]/g, (d) => SUB[d]);

// The realistic mix: the plain formulas above with about 20 % of lines carrying a
// charge, D, a decimal count, a '.' hydrate, Unicode subscripts or spaces at the ends.
export function* generateMixedFormulas(n, seed = 777) {
  let s = seed >>> 0;
  const rnd = () => ((s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32);
  const int = (a, b) => a + Math.floor(rnd() * (b - a + 1));
  let i = 0;
  for (const f of generateFormulas(n, seed + 1)) {
    const k = rnd();
    let g = f;
    if (k < 0.04) g = ['SO4^2-', 'NH4^+', '[Fe(CN)6]^4-', 'PO4^3-', 'Cl-', 'Fe³⁺', `C${int(1, 20)}H${int(1, 40)}O${int(1, 5)}^-`][int(0, 6)];
    else if (k < 0.08) g = `C${int(1, 30)}D${int(1, 60)}O${int(0, 4)}`.replace(/O0$/, '');
    else if (k < 0.12) g = rnd() < 0.5 ? `${['Fe', 'Ni', 'Co', 'Mn'][int(0, 3)]}0.${int(80, 99)}O` : `YBa2Cu3O6.${int(10, 99)}`;
    else if (k < 0.16) g = `${['CuSO4', 'CaSO4', 'MgSO4', 'Na2CO3', 'CaCl2'][int(0, 4)]}.${int(1, 10)}H2O`;
    else if (k < 0.2) g = f.replace(/([A-Za-z)\]])([0-9]+)/g, (m, a, d) => a + sub(d)); // counts only: a multiplier stays ASCII
    else if (k < 0.22) g = ` ${f} `;
    yield g;
    if (++i >= n) return;
  }
}
