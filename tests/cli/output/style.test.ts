import { describe, expect, it } from 'vitest';
import { styleAt, styleFor } from '../../../src/cli/output/style.js';

// source: ECMA-48 (5th edition, 1991), 8.3.117 SGR: 1 bold, 2 faint, 22 normal intensity,
// 31 red, 33 yellow, 36 cyan, 39 default display colour
const ESC = '\u001b[';

describe('output styles', () => {
  it('wraps a text in the SGR codes of each style', () => {
    const s = styleAt(1);
    expect(s.red('error')).toBe(`${ESC}31merror${ESC}39m`);
    expect(s.yellow('caution')).toBe(`${ESC}33mcaution${ESC}39m`);
    expect(s.cyan('█')).toBe(`${ESC}36m█${ESC}39m`);
    expect(s.dim('note')).toBe(`${ESC}2mnote${ESC}22m`);
    expect(s.bold('input')).toBe(`${ESC}1minput${ESC}22m`);
  });

  it('closes and reopens the style at each line break, so each line carries its colour', () => {
    expect(styleAt(2).red('a\nb')).toBe(`${ESC}31ma${ESC}39m\n${ESC}31mb${ESC}39m`);
    expect(styleAt(3).red('a\r\nb')).toBe(`${ESC}31ma${ESC}39m\r\n${ESC}31mb${ESC}39m`);
  });

  it('reopens the style after a close inside the text', () => {
    expect(styleAt(1).red(`x${ESC}39my`)).toBe(`${ESC}31mx${ESC}39m${ESC}31my${ESC}39m`);
  });

  it('leaves the empty text empty, and every text unchanged with colour off', () => {
    expect(styleAt(1).bold('')).toBe('');
    const plain = styleAt(0);
    for (const k of ['red', 'yellow', 'cyan', 'dim', 'bold'] as const) expect(plain[k]('a\nb')).toBe('a\nb');
  });

  it('follows the stream and the environment', () => {
    expect(styleFor({ isTTY: true }, {}).level).toBe(1);
    expect(styleFor({ isTTY: true }, { NO_COLOR: '1' }).red('e')).toBe('e');
    expect(styleFor({ isTTY: false }, { FORCE_COLOR: '3' }).level).toBe(3);
  });
});
