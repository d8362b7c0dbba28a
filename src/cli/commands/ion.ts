import type { Command } from 'commander';
import { fail } from '../../errors/pondus-error.js';
import { ionJson } from '../../ions/ion-json.js';
import { ionMass, type IonResult } from '../../ions/ion-mass.js';
import { readIonSheet, type IonSheetRow } from '../../ions/ion-sheet.js';
import { readIonLine } from '../../ions/read-ion-line.js';
import { signedFixed } from '../../ions/mass-error.js';
import type { Presenter } from '../output/presenter.js';
import { attachPattern } from './pattern.js';
import type { CommandRunner } from './runner.js';
import { runWithSheet, type SheetOptions } from './sheet-runner.js';

import { Decimal } from '../../exact/decimal.js';
import { declareIon } from './declarations.js';
export interface IonCliOptions extends SheetOptions<IonSheetRow> {
  adduct?: string;
  found?: string;
  ionisation?: string;
  decimals?: string;
  abbreviations?: boolean;
}

interface IonRow {
  result: IonResult;
  id: string | null;
  /** The input as given (a batch line keeps its ion and found m/z); a sheet row gives its formula. */
  input: string;
}

/**
 * The fields of one input: a sheet row, or a line / argument `FORMULA [ION] [FOUND]`, with the
 * options filling what the input leaves out (and refusing when both give the same field).
 */
function fields(input: string, o: IonCliOptions): { formula: string | null; ion: string | null; found: string | undefined; id: string | null } {
  const row = o.sheetRows?.[input];
  const line = row
    ? { formula: row.formula === '' ? null : row.formula, ion: row.ion === '' ? null : row.ion, found: row.found === '' ? null : row.found }
    : readIonLine(input);
  if (row && line.formula === null && !(line.ion ?? '').startsWith('[')) throw fail({ code: 'BAD_RECORD', message: `row ${row.id || row.line} has no formula` }, input);
  if (line.ion !== null && o.adduct !== undefined) throw fail({ code: 'ION_CONFLICT', message: `the input names the ion ${line.ion} and --adduct gives ${o.adduct}: give one of them` }, input);
  if (line.found !== null && o.found !== undefined) throw fail({ code: 'ION_CONFLICT', message: `the input gives a found m/z (${line.found}) and --found gives ${o.found}: give one of them` }, input);
  return { formula: line.formula, ion: line.ion ?? o.adduct ?? null, found: line.found ?? o.found, id: row ? row.id : null };
}

/**
 * The presenter for `pondus ion`.
 *
 * @example
 * ionPresenter({ adduct: '[M+H]+' }).compute('C15H15NO2').result.calculatedText // '242.1176'
 */
export function ionPresenter(o: IonCliOptions): Presenter<IonRow> {
  const decimals = o.decimals === undefined ? 4 : Number(o.decimals);
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 8) throw fail({ code: 'USAGE', message: `--decimals takes a whole number from 0 to 8, not '${o.decimals}'` });
  const opts = { ionisation: o.ionisation ?? 'ESI', decimals, abbreviations: !!o.abbreviations };
  const ppm = (r: IonResult) => (r.found ? signedFixed(new Decimal(r.found.ppmExact), 1) : '');
  const mda = (r: IonResult) => (r.found ? signedFixed(new Decimal(r.found.mDaExact), 1) : '');
  return {
    compute: (input) => {
      const f = fields(input, o);
      const result = ionMass(f.formula, f.ion, { ...opts, found: f.found });
      return { result, id: f.id, input: o.sheetRows?.[input] ? result.input : input };
    },
    json: ({ result, id, input }) => Object.assign(ionJson(result, id !== null ? { id } : {}), { input }),
    columns: ['input', 'id', 'formula', 'ion', 'ionFormula', 'charge', 'mz', 'calculated', 'found', 'errorPpm', 'errorMDa', 'reportLine'],
    cells: ({ result: r, id, input }) => [input, id ?? '', r.formula, r.notation ?? '', r.ionFormula, r.charge, new Decimal(r.mzExact).toDecimalPlaces(12).toFixed(), r.calculatedText, r.found?.text ?? '', ppm(r), mda(r), r.reportLine ?? ''],
    block: ({ result: r, id }) => {
      const z = `${Math.abs(r.charge)}${r.charge > 0 ? '+' : '-'}`;
      const lines = [`${id ? `${id}: ` : ''}${r.formula}  ${r.notation ?? r.journalNotation}  →  ${r.ionFormula}   m/z ${r.calculatedText}  (charge ${z}${r.oddElectron ? ', odd-electron' : ''})`];
      if (r.found) lines.push(`  found ${r.found.text}: error ${ppm(r)} ppm (${mda(r)} mDa), as (found − calculated)/calculated`);
      lines.push(`  ${r.reportLine ?? `HRMS (${r.ionisation}) m/z: ${r.journalNotation} calcd for ${r.ionFormulaPlain} ${r.calculatedText}`}`);
      return lines.join('\n');
    },
    notes: ({ result: r }) => r.notes,
    noteItems: ({ result: r }) => r.notes,
  };
}

/**
 * Registers `pondus ion` and `pondus pattern`.
 *
 * @example
 * registerIonCommands(program, run, () => process.stdin)
 */
export function registerIonCommands(program: Command, run: CommandRunner, stdin: () => AsyncIterable<string | Buffer>, only?: string): void {
  const c = declareIon(program, only);
  c.ion?.action((inputs: string[], o: IonCliOptions) => {
    if (o.found !== undefined && (inputs.length > 1 || inputs.includes('-') || o.sheet !== undefined)) {
      throw fail({ code: 'USAGE', message: '--found goes with one input; in a batch, give the found m/z on each line (FORMULA ION FOUND)' });
    }
    return runWithSheet(run, 'ion', inputs, o, stdin, readIonSheet);
  });
  if (c.pattern) attachPattern(c.pattern, run);
}
