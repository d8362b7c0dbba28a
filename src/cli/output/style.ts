/**
 * Colour for the command line's output streams: the five styles it uses (red for errors, yellow
 * for cautions, dim for notes, bold for table heads, cyan for plots), as the plain ANSI SGR codes
 * (ECMA-48) every colour terminal reads. Written here rather than taken from a colour library:
 * the library built some fifty styles at every start-up, about a millisecond and 90 kB of a
 * command's start (npm run bench, start-up rows), for five escape pairs.
 */

/** The colour level for one output stream: 0 none, 1 to 3 colour (the codes used are the same at every level). */
export type ColorLevel = 0 | 1 | 2 | 3;

/**
 * The colour level for one output stream, from the environment:
 * `NO_COLOR` (not empty) turns colour off, whatever else is set; `FORCE_COLOR=0` (or `false`)
 * turns it off; `FORCE_COLOR=1`, `2` or `3` (or empty, or `true`) turns it on at that level even
 * on a pipe; `TERM=dumb` turns it off unless forced; otherwise colour only on a terminal.
 *
 * @example
 * colorLevel({ isTTY: true }, { TERM: 'dumb' }) // 0
 * colorLevel({ isTTY: false }, { FORCE_COLOR: '1' }) // 1
 */
export function colorLevel(stream: { isTTY?: boolean }, env: Record<string, string | undefined> = process.env): ColorLevel {
  if (env.NO_COLOR !== undefined && env.NO_COLOR !== '') return 0;
  const force = env.FORCE_COLOR;
  if (force !== undefined) {
    if (force === '0' || force.toLowerCase() === 'false') return 0;
    const n = Number.parseInt(force, 10);
    return n >= 1 && n <= 3 ? (n as 1 | 2 | 3) : 1;
  }
  if (env.TERM === 'dumb') return 0;
  return stream.isTTY ? 1 : 0;
}

/** A style: the text wrapped in its escape codes, or the text itself when colour is off. */
export type Paint = (text: string) => string;

/** The styles of one output stream. */
export interface Style {
  readonly level: ColorLevel;
  readonly red: Paint;
  readonly yellow: Paint;
  readonly cyan: Paint;
  readonly dim: Paint;
  readonly bold: Paint;
}

const CSI = '\u001b[';

/**
 * A style from its SGR open and close codes. Each line of the text is wrapped on its own (a
 * terminal or pager that resets at a line break keeps the colour on the next line), and a close
 * inside the text reopens the style after it. The empty text stays empty.
 */
function paint(open: number, close: number): Paint {
  const on = `${CSI}${open}m`;
  const off = `${CSI}${close}m`;
  return (text) => {
    if (text === '') return '';
    let body = text.includes(off) ? text.replaceAll(off, off + on) : text;
    if (body.includes('\n')) body = body.replace(/\r?\n/g, (br) => off + br + on);
    return on + body + off;
  };
}

const same: Paint = (text) => text;
const PLAIN: Style = Object.freeze({ level: 0, red: same, yellow: same, cyan: same, dim: same, bold: same });
const COLOURED = { red: paint(31, 39), yellow: paint(33, 39), cyan: paint(36, 39), dim: paint(2, 22), bold: paint(1, 22) };

/**
 * The styles for a colour level: at 0 each gives the text unchanged.
 *
 * @example
 * styleAt(1).red('error') // '\u001b[31merror\u001b[39m'
 * styleAt(0).red('error') // 'error'
 */
export function styleAt(level: ColorLevel): Style {
  return level === 0 ? PLAIN : { level, ...COLOURED };
}

/**
 * The styles for one output stream, at the level {@link colorLevel} gives.
 *
 * @example
 * styleFor({ isTTY: false }, {}).red('error') // 'error'
 * styleFor({ isTTY: true }, {}).dim('note') // '\u001b[2mnote\u001b[22m'
 */
export function styleFor(stream: { isTTY?: boolean }, env: Record<string, string | undefined> = process.env): Style {
  return styleAt(colorLevel(stream, env));
}
