// The command line as a process: bin/pondus.cjs starts one bundle per command module (dist/cli/),
// answers --version itself, and --help / <command> --help off a terminal from the help texts the
// build wrote (dist/cli/help.json). Each way must give exactly what the whole program gives
// (dist/test/cli-main.cjs, run in a worker by `pondus`): same text, same status.
import { spawnSync } from 'node:child_process';
import { cpSync, existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { CANDIDATE_RANGES, COMBUSTION_PRODUCTS } from '../../src/cli/commands/declarations.js';
import { HELP_EXAMPLES } from '../../src/cli/help-examples.js';
import { DEFAULT_RANGES } from '../../src/empirical/candidates.js';
import { PRODUCTS } from '../../src/empirical/combustion.js';
import { listedCommands, shellWords } from '../support/command-lines.js';
import { pondus, pondusProcess } from './run-cli.js';

const root = join(__dirname, '..', '..');
const commands = listedCommands(new Set(['help']));
const bin = readFileSync(join(root, 'bin', 'pondus.cjs'), 'utf8');
const table = new Function(`return ${/const BUNDLE = (\{[\s\S]*?\});/.exec(bin)![1]}`)() as Record<string, string>;

describe('each command starts from a bundle that has it', () => {
  it('the start-up table names a bundle for every command that prints results', () => {
    const own = new Set(['completion', 'manual']); // the help bundle's own commands
    expect(commands.filter((c) => !own.has(c)).sort()).toEqual(Object.keys(table).sort());
  });

  // `<command> --json --help` is not answered from the help texts: it starts the command's bundle
  it.each(commands.filter((c) => c !== 'completion' && c !== 'manual'))('%s --help from its own bundle is the whole program\'s', (name) => {
    const own = pondusProcess([name, '--json', '--help']);
    expect(own.stderr).toBe('');
    expect(own.status).toBe(0);
    expect(own.stdout).toBe(pondus([name, '--help']).stdout);
  });

  // one real command line per bundle: its presenters are there and give what the whole program gives
  it.each([...new Set(Object.values(table))])('the %s bundle computes as the whole program does', (bundle) => {
    const name = Object.keys(table).find((c) => table[c] === bundle)!;
    const args = shellWords(HELP_EXAMPLES[name][0]).slice(1);
    const own = pondusProcess(args);
    const whole = pondus(args);
    expect(own.status).toBe(0);
    expect(own.stdout).toBe(whole.stdout);
    expect(own.stderr).toBe(whole.stderr);
  });
});

describe('--help and --version without a bundle', () => {
  it('--help and -h print the program\'s help, as the whole program does', () => {
    const whole = pondus(['--help']);
    for (const flag of ['--help', '-h']) {
      const r = pondusProcess([flag]);
      expect(r.status).toBe(0);
      expect(r.stderr).toBe('');
      expect(r.stdout).toBe(whole.stdout);
    }
  });

  it.each(['mass', 'prepare', 'titration', 'pattern'])('%s --help and -h print the command\'s help, as the whole program does', (name) => {
    const whole = pondus([name, '--help']);
    for (const flag of ['--help', '-h']) {
      const r = pondusProcess([name, flag]);
      expect(r.status).toBe(0);
      expect(r.stdout).toBe(whole.stdout);
    }
  });

  it('the help bundle lists the commands in the whole program\'s order (pondus help)', () => {
    const r = pondusProcess(['help']);
    expect(r.status).toBe(0);
    expect(r.stdout).toBe(pondus(['help']).stdout);
    expect(r.stdout).toBe(pondus(['--help']).stdout);
  });

  it('--version and -V print the package version', () => {
    const { version } = JSON.parse(readFileSync(join(root, 'package.json'), 'utf8')) as { version: string };
    expect(pondus(['--version']).stdout).toBe(`${version}\n`);
    for (const flag of ['--version', '-V']) {
      const r = pondusProcess([flag]);
      expect(r.status).toBe(0);
      expect(r.stdout).toBe(`${version}\n`);
    }
  });

  it('an unknown command, bare pondus, completion and the manual come from the help bundle as from the whole program', () => {
    for (const args of [['weigh', 'H2O'], ['mas'], [], ['--frobnicate'], ['completion', 'zsh'], ['manual'], ['help', 'mass']]) {
      const r = pondusProcess(args);
      const whole = pondus(args);
      expect({ args, status: r.status, stdout: r.stdout, stderr: r.stderr }).toEqual({ args, status: whole.status, stdout: whole.stdout, stderr: whole.stderr });
    }
  });
});

describe('the declarations hold the same values as the library', () => {
  it('combustion products', () => {
    expect(COMBUSTION_PRODUCTS).toEqual(PRODUCTS);
  });
  it('the default element ranges of candidates', () => {
    expect(CANDIDATE_RANGES).toBe(DEFAULT_RANGES);
  });
});

describe('the grammars, a file of their own', () => {
  // dist/cli/grammars.cjs holds the formula and calculator grammars; a bundle loads it (from its
  // own code cache) when an input first needs the full parser. A copy of the command line in a
  // scratch folder shows the file's cache written when it is missing and a broken cache ignored.
  const inputs = ['[13C]H4', 'CuSO4.5H2O', 'H2O'];
  it('gives what the whole program gives, with its cache missing, written, and broken', () => {
    const dir = mkdtempSync(join(tmpdir(), 'pondus-grammars-'));
    try {
      cpSync(join(root, 'bin'), join(dir, 'bin'), { recursive: true });
      cpSync(join(root, 'dist', 'cli'), join(dir, 'dist', 'cli'), { recursive: true });
      cpSync(join(root, 'dist', 'data'), join(dir, 'dist', 'data'), { recursive: true });
      cpSync(join(root, 'package.json'), join(dir, 'package.json'));
      const cache = join(dir, 'dist', 'cli', 'grammars.cache');
      rmSync(cache, { force: true });
      const whole = pondus(['mass', '--json', ...inputs]);
      const run = () => spawnSync(process.execPath, [join(dir, 'bin', 'pondus.cjs'), 'mass', '--json', ...inputs], { encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' } });
      for (const stage of ['missing', 'written', 'broken']) {
        if (stage === 'broken') writeFileSync(cache, Buffer.alloc(4096, 7));
        const r = run();
        expect(r.status, stage).toBe(whole.status);
        expect(r.stdout, stage).toBe(whole.stdout);
        expect(r.stderr, stage).toBe(whole.stderr);
        if (stage === 'missing') expect(existsSync(cache)).toBe(true);
      }
      // the formula bundle itself does not carry the parser library
      expect(readFileSync(join(dir, 'dist', 'cli', 'mass.cjs'), 'latin1')).not.toMatch(/performSelfAnalysis/);
      expect(readFileSync(join(dir, 'dist', 'cli', 'grammars.cjs'), 'latin1')).toMatch(/performSelfAnalysis/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
