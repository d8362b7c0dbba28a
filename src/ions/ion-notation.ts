/**
 * The typed form of an ion written in the notation of the trade: `[M+H]+`, `[M-H]-`,
 * `[2M+Na]+`, `[M+H-H2O]+`, `[M+2H]2+`, `M+•`. Reading it never computes a mass.
 */
import type { AtomCounts } from '../formula/flatten.js';

/** One term added to or taken from the molecule: `+Na`, `-H2O`, `+2H`. */
export interface IonTerm {
  /** +1 added, -1 taken away. */
  sign: 1 | -1;
  /** How many times the term is added or taken (2 in `+2H`). */
  count: number;
  /** The term as written ('Na', 'H2O', 'HCOO'). */
  text: string;
  /** The term's atoms (neutral atoms: the electrons are counted by the charge). */
  atoms: AtomCounts;
  /** The term's Hill formula ('CHO2' for HCOO). */
  formula: string;
  /** 1-based column of the term's first character in the notation. */
  column: number;
}

/** An ion notation read from text. */
export interface IonNotation {
  /** The text as given. */
  input: string;
  /** How many molecules (2 in `[2M+Na]+`). */
  multiplier: number;
  /** A formula written in place of M (`[C15H15NO2+H]+`), or null when the notation uses M. */
  formula: string | null;
  /** 1-based column of that formula, when written. */
  formulaColumn: number | null;
  terms: IonTerm[];
  /** Net charge in elementary charges (never 0). */
  charge: number;
  /** True when a radical dot is written (`M+•`, `M+.`). */
  radical: boolean;
  /** The notation as pondus writes it: `[M+H]+`, `[M-H]-`, `[M+2H]2+`, `M+•`. */
  canonical: string;
  /** The notation with spaces around the signs, as journals print it: `[M + H]+`. */
  journal: string;
}
