// The command line's shared conventions: one table of exit statuses, help that ends with real
// examples, colour that obeys the environment, shell completion and a manual page generated from
// the program itself.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Writable } from 'node:stream';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { HELP_EXAMPLES } from '../../src/cli/help-examples.js';
import { EXIT_STATUS } from '../../src/cli/completion.js';
import { colorLevel } from '../../src/cli/output/style.js';
import { listedCommands, shellWords } from '../support/command-lines.js';
import { pondus, pondusProcess } from '../cli/run-cli.js';

const commandNames = listedCommands(new Set(['help']));

describe('exit statuses: 0 all good, 1 some input failed, 2 usage', () => {
  it('the table has the three statuses', () => {
    expect(EXIT_STATUS.map(([c]) => c)).toEqual([0, 1, 2]);
  });
  it('every command is known to the test', () => {
    expect(commandNames.length).toBeGreaterThanOrEqual(25);
    expect(commandNames).toContain('completion');
    expect(commandNames).toContain('manual');
  });
  // a command given its input but not the options it needs: a usage error
  const usage: [string, string[]][] = [
    ['prepare without a target', ['prepare', 'NaCl']],
    ['dilute without --to and --volume', ['dilute', '1.00 M']],
    ['gravimetric without --weighed', ['gravimetric', 'Fe']],
    ['basis without --to', ['basis', 'P2O5']],
    ['salt without --parent', ['salt', 'C17H19NO3·HCl']],
    ['react without --amount', ['react', 'H2 + O2 -> H2O']],
    ['combustion without products', ['combustion', '1.000 g']],
    ['an unknown option', ['mass', 'H2O', '--frobnicate']],
    ['an unknown command', ['weigh', 'H2O']],
    ['two output formats', ['mass', 'H2O', '--json', '--csv']],
    ['an option given twice', ['dilute', '1.00 M', '--to', '0.1 M', '--to', '0.2 M', '--volume', '1 L']],
    ['a choice not offered', ['mass', 'H2O', '--weights', 'old']],
    ['no inputs', ['mass']],
    ['a shell not offered', ['completion', 'tcsh']],
    ['candidates with found percents and no mass', ['candidates', '--found', 'C=40.00 H=6.71 O=53.29']],
    ['--rounding where JSON carries every digit', ['mass', 'H2O', '--json', '--rounding', 'half-up']],
    ['--rounding where CSV carries every digit', ['composition', 'H2O', '--csv', '--rounding', 'half-up']],
  ];
  for (const [what, args] of usage) {
    it(`${what}: 2`, () => {
      const r = pondus(args);
      expect(r.status, r.stderr).toBe(2);
      expect(r.stderr).toMatch(/^pondus: \S/); // one message style
      expect(r.stderr).not.toMatch(/\n\s+at /); // no stack trace
    });
  }
  it("a negative number read as an option: 2, with the '--' that makes it an input", () => {
    const r = pondus(['calc', '-5 g']);
    expect(r.status).toBe(2);
    expect(r.stderr).toContain("put -- after the options and before all the inputs");
    expect(pondus(['calc', '--', '-5 g']).stdout).toContain('-5 g');
  });
  it('options that conflict only once an input is read: 2, each input still answered in its place', () => {
    // --by volume with a total that is a mass: found when the strengths are read
    const r = pondus(['alligation', '--json', '70 %', '60 %', '--higher', '95 %', '--lower', '0 %', '--by', 'volume', '--total', '300 g']);
    expect(r.status, r.stderr).toBe(2);
    const rows = r.stdout.trim().split('\n').map((l) => JSON.parse(l));
    expect(rows.map((o) => [o.line, o.error.code])).toEqual([[1, 'USAGE'], [2, 'USAGE']]);
  });
  it('an input that fails: 1, and the other inputs still answer', () => {
    const r = pondus(['mass', '--json', 'H2O', 'Xx', 'NaCl']);
    expect(r.status).toBe(1);
    expect(r.stdout.trim().split('\n')).toHaveLength(3);
  });
  it('all good: 0', () => {
    expect(pondus(['mass', 'H2O']).status).toBe(0);
  });
  it('bare pondus prints its help once, on standard output, and exits 2', () => {
    const r = pondus([]);
    expect(r.status).toBe(2);
    expect(r.stdout.match(/Usage: pondus/g)).toHaveLength(1);
    expect(r.stderr).toBe('');
  });
  it('--help and --version exit 0', () => {
    expect(pondus(['--help']).status).toBe(0);
    expect(pondus(['--version']).status).toBe(0);
    expect(pondus(['mass', '--help']).status).toBe(0);
  });
});

describe('every command --help ends with real examples', () => {
  it('every command has two or three examples', () => {
    for (const name of commandNames) {
      const n = HELP_EXAMPLES[name]?.length ?? 0;
      expect(n, name).toBeGreaterThanOrEqual(name === 'manual' ? 1 : 2);
      expect(n, name).toBeLessThanOrEqual(3);
    }
  });
  for (const name of commandNames) {
    it(`${name} --help ends with its examples, and each runs with status 0`, () => {
      const help = pondus([name, '--help']).stdout;
      const tail = help.slice(help.lastIndexOf('Examples:'));
      expect(tail.trim().split('\n').slice(1).map((l) => l.trim())).toEqual(HELP_EXAMPLES[name].map((e) => `$ ${e}`));
      for (const example of HELP_EXAMPLES[name]) {
        const words = shellWords(example);
        expect(words[0]).toBe('pondus');
        expect(words[1]).toBe(name);
        const r = pondus(words.slice(1));
        expect(r.status, `${example}\n${r.stderr}`).toBe(0);
        expect(r.stdout, example).toMatch(/\S/);
      }
    });
  }
  it('the shell-word reader splits as a shell does', () => {
    expect(shellWords("pondus dilute '1.00 M' --to '0.100 M'")).toEqual(['pondus', 'dilute', '1.00 M', '--to', '0.100 M']);
    expect(shellWords('pondus manual > pondus.1 && man ./pondus.1')).toEqual(['pondus', 'manual']);
  });
});

describe('every CSV row starts with input and line', () => {
  // the JSON rows carry input and line; a CSV row is traced to its input the same way, also
  // where one input gives several rows (composition --long, a dilution plan's steps)
  const FORMAT = /^--(json|csv|tsv|markdown|svg)$/;
  for (const name of commandNames) {
    // --explain is for the table and JSON (a usage error with --csv)
    const examples = HELP_EXAMPLES[name].map(shellWords).filter((w) => !w.some((a) => FORMAT.test(a) || a === '--explain') && !['completion', 'manual'].includes(name));
    if (examples.length === 0) continue;
    it(`${name}: input, then line, on every row of each example`, () => {
      for (const words of examples) {
        const r = pondus([...words.slice(1), '--csv']);
        const [header, ...rows] = parse(r.stdout) as string[][];
        expect(header.slice(0, 2), words.join(' ')).toEqual(['input', 'line']);
        expect(rows.length).toBeGreaterThan(0);
        const lines = rows.map((row) => Number(row[1]));
        for (const n of lines) expect(Number.isInteger(n) && n >= 1, words.join(' ')).toBe(true);
        expect([...lines].sort((a, b) => a - b)).toEqual(lines);
      }
    });
  }
  it('a failed input fills its line, between good ones', () => {
    const [header, ...rows] = parse(pondus(['mass', '--csv', '-'], 'H2O\nXq\nNaCl\n').stdout) as string[][];
    expect(header.slice(0, 2)).toEqual(['input', 'line']);
    expect(rows.map((r) => [r[0], r[1], r.at(-2)])).toEqual([['H2O', '1', ''], ['Xq', '2', 'UNKNOWN_ELEMENT'], ['NaCl', '3', '']]);
  });
});

describe('colour follows the environment', () => {
  it('the level, case by case', () => {
    const tty = { isTTY: true };
    const pipe = { isTTY: false };
    expect(colorLevel(tty, {})).toBe(1);
    expect(colorLevel(pipe, {})).toBe(0);
    expect(colorLevel(tty, { NO_COLOR: '1' })).toBe(0);
    expect(colorLevel(tty, { NO_COLOR: '' })).toBe(1); // an empty NO_COLOR does not count (no-color.org)
    expect(colorLevel(tty, { FORCE_COLOR: '0' })).toBe(0);
    expect(colorLevel(tty, { FORCE_COLOR: 'false' })).toBe(0);
    expect(colorLevel(tty, { TERM: 'dumb' })).toBe(0);
    expect(colorLevel(pipe, { FORCE_COLOR: '1' })).toBe(1);
    expect(colorLevel(pipe, { FORCE_COLOR: '3' })).toBe(3);
    expect(colorLevel(pipe, { FORCE_COLOR: '1', NO_COLOR: '1' })).toBe(0);
    expect(colorLevel(pipe, { FORCE_COLOR: '1', TERM: 'dumb' })).toBe(1);
  });

  // the built CLI on a terminal: an error is red unless the environment says otherwise
  const require = createRequire(import.meta.url);
  class Tty extends Writable {
    text = '';
    isTTY = true;
    _write(chunk: Buffer | string, _e: string, done: () => void) {
      this.text += chunk.toString();
      done();
    }
  }
  async function onTerminal(env: Record<string, string | undefined>): Promise<string> {
    const { main } = require('../../dist/test/cli-main.cjs') as { main: (a: string[], io: unknown) => Promise<number> };
    const keys = ['NO_COLOR', 'FORCE_COLOR', 'TERM'];
    const saved = Object.fromEntries(keys.map((k) => [k, process.env[k]]));
    for (const k of keys) {
      if (env[k] === undefined) delete process.env[k];
      else process.env[k] = env[k];
    }
    try {
      const stdout = new Tty();
      const stderr = new Tty();
      await main(['mass', 'Xx'], { stdin: () => (async function* () {})(), stdout, stderr });
      return stderr.text;
    } finally {
      for (const k of keys) {
        if (saved[k] === undefined) delete process.env[k];
        else process.env[k] = saved[k];
      }
    }
  }
  it('on a terminal, colour by default; off with NO_COLOR, FORCE_COLOR=0 or TERM=dumb', async () => {
    expect(await onTerminal({ TERM: 'xterm-256color' })).toMatch(/\u001b\[/);
    expect(await onTerminal({ TERM: 'xterm-256color', NO_COLOR: '1' })).not.toMatch(/\u001b\[/);
    expect(await onTerminal({ TERM: 'xterm-256color', FORCE_COLOR: '0' })).not.toMatch(/\u001b\[/);
    expect(await onTerminal({ TERM: 'dumb' })).not.toMatch(/\u001b\[/);
  });
  it('on a pipe, no colour unless forced', () => {
    expect(pondus(['mass', 'Xx'], undefined, { NO_COLOR: '' }).stderr).not.toMatch(/\u001b\[/);
    expect(pondus(['mass', 'Xx'], undefined, { NO_COLOR: '', FORCE_COLOR: '1' }).stderr).toMatch(/\u001b\[/);
  });
});

describe('shell completion and the manual page', () => {
  const optionsOf = (name: string) => [...pondus([name, '--help']).stdout.matchAll(/^ {2}(?:-\w, )?(--[a-z][a-z0-9-]*)/gm)].map((m) => m[1]);
  for (const shell of ['bash', 'zsh', 'fish']) {
    it(`${shell}: names every command and every option`, () => {
      const r = pondus(['completion', shell]);
      expect(r.status).toBe(0);
      for (const name of commandNames) {
        expect(r.stdout, name).toMatch(new RegExp(`(^|[\\s'(])${name}[\\s):']`));
        for (const opt of optionsOf(name)) expect(r.stdout, `${name} ${opt}`).toContain(shell === 'fish' ? `-l ${opt.slice(2)}` : opt);
      }
    });
  }
  it('bash parses the bash script, and it completes commands, options and choices', () => {
    const dir = mkdtempSync(join(tmpdir(), 'pondus-completion-'));
    const file = join(dir, 'pondus.bash');
    writeFileSync(file, pondus(['completion', 'bash']).stdout);
    expect(spawnSync('bash', ['-n', file], { encoding: 'utf8' }).status).toBe(0);
    const complete = (words: string[]) =>
      spawnSync('bash', ['-c', `source ${file}; COMP_WORDS=(${words.map((w) => `'${w}'`).join(' ')}); COMP_CWORD=${words.length - 1}; _pondus; echo "\${COMPREPLY[*]}"`], { encoding: 'utf8' }).stdout.trim();
    expect(complete(['pondus', 'sa'])).toBe('salt sample-basis');
    expect(complete(['pondus', 'mass', '--we'])).toBe('--weights');
    expect(complete(['pondus', 'mass', '--weights', ''])).toBe('standard abridged');
    expect(complete(['pondus', 'completion', '--h'])).toBe('--help');
  });
  it('zsh and fish parse their scripts, where installed', () => {
    for (const [shell, flag] of [['zsh', '-n'], ['fish', '--no-execute']] as const) {
      if (spawnSync(shell, ['--version']).error) continue;
      const dir = mkdtempSync(join(tmpdir(), 'pondus-completion-'));
      const file = join(dir, `pondus.${shell}`);
      writeFileSync(file, pondus(['completion', shell]).stdout);
      expect(spawnSync(shell, [flag, file], { encoding: 'utf8' }).status).toBe(0);
    }
  });
  it('the manual page has every command, its options and examples, and the exit statuses', () => {
    const r = pondus(['manual']);
    expect(r.status).toBe(0);
    expect(r.stdout.startsWith('.TH PONDUS 1 "" "pondus 0.1.0"')).toBe(true);
    for (const name of commandNames) expect(r.stdout, name).toContain(`.SS "pondus ${name.replace(/-/g, '\\-')}`);
    expect(r.stdout).toContain('\\-\\-concentration <c>');
    expect(r.stdout).toContain(".SH EXIT STATUS\n.TP\n.B 0\n");
    expect(r.stdout).not.toMatch(/[^\x00-\x7f]/); // non-ASCII written as \[uXXXX]
  });
  it('groff formats the manual page without a warning, where installed', () => {
    if (spawnSync('groff', ['--version']).error) return;
    const page = pondus(['manual']).stdout;
    const r = spawnSync('groff', ['-man', '-Tutf8', '-ww', '-z'], { input: page, encoding: 'utf8' });
    expect(r.stderr.split('\n').filter((l) => /warning|error/.test(l) && !/cannot adjust line|cannot break line/.test(l))).toEqual([]);
  });
  it('the process itself: bare pondus, and the manual page written by the build', () => {
    const r = pondusProcess([]);
    expect(r.status).toBe(2);
    expect(r.stdout.match(/Usage: pondus/g)).toHaveLength(1);
    // npm run build writes dist/pondus.1 (shipped, and named in package.json "man") from the same text
    expect(readFileSync(new URL('../../dist/pondus.1', import.meta.url), 'utf8')).toBe(pondus(['manual']).stdout);
    const pkg = JSON.parse(readFileSync(new URL('../../package.json', import.meta.url), 'utf8'));
    expect(pkg.files).toContain('dist/pondus.1');
    expect(pkg.man).toEqual(['./dist/pondus.1']);
  });
});

describe('CSV numbers', () => {
  it('a quotient that does not end is the number JSON gives, not 50 digits; an exact sum stays exact', () => {
    // the gravimetric factor Fe/Fe2O3 was written 0.69943076142704165022825903173082342332187341486784
    const csv = parse(pondus(['gravimetric', 'Fe', '--weighed', 'Fe2O3', '--csv']).stdout, { columns: true }) as Record<string, string>[];
    const json = JSON.parse(pondus(['gravimetric', 'Fe', '--weighed', 'Fe2O3', '--json']).stdout);
    expect(csv[0].factor).toBe(String(json.factor));
    const mass = parse(pondus(['mass', 'C6H12O6', '--csv']).stdout, { columns: true }) as Record<string, string>[];
    expect(mass[0].molarMass).toBe('180.156'); // source: CIAAW 2021: 6 × 12.011 + 12 × 1.008 + 6 × 15.999
  });

  it('the prep sheet says the unit of its amount_base column', () => {
    const sheet = 'reagent,form,purity,density,target,volume\nsodium chloride,NaCl,,,0.100 M,250.0 mL\nhydrochloric acid,HCl,37 %,1.19 g/mL,1.00 M,500.0 mL\n';
    const rows = parse(pondus(['prepare', '--sheet', '-', '--csv'], sheet).stdout, { columns: true }) as Record<string, string>[];
    expect(rows.map((r) => r.base_unit)).toEqual(['g', 'L']);
  });
});
