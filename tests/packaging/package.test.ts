// The package as users get it: packed, installed into a fresh project, then used from ESM, from
// CommonJS, from strict TypeScript under each module resolution, and as a command.
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';

const root = join(__dirname, '..', '..');
const tsc = join(root, 'node_modules', 'typescript', 'bin', 'tsc');
let dir = '';

function node(args: string[], cwd = dir): string {
  return execFileSync(process.execPath, args, { cwd, encoding: 'utf8' });
}

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'pondus-pack-'));
  // the build npm test has just made (npm pack would otherwise run `prepare` and build again,
  // rewriting dist/ while other test files read it)
  execFileSync('npm', ['pack', '--silent', '--ignore-scripts', '--pack-destination', dir], { cwd: root, stdio: 'ignore' });
  const tarball = readdirSync(dir).find((f) => f.endsWith('.tgz'))!;
  writeFileSync(join(dir, 'package.json'), JSON.stringify({ name: 'consumer', version: '1.0.0', private: true }));
  // the one runtime dependency (decimal.js) comes from npm's cache, filled by `npm ci`
  execFileSync('npm', ['install', '--prefer-offline', '--no-audit', '--no-fund', '--silent', `./${tarball}`], { cwd: dir, stdio: 'ignore' });
}, 120_000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('the packed package', () => {
  it('ships the bundles, declarations, data and licence, and no code cache', () => {
    const files = readdirSync(join(dir, 'node_modules', 'pondus', 'dist'));
    expect(files).toEqual(expect.arrayContaining(['lib', 'types', 'data', 'cli', 'cli.cjs']));
    // the command line's bundles (one per command module, and help) and its help texts, without
    // the V8 code caches the build wrote beside them (valid for one Node build only)
    const cli = readdirSync(join(dir, 'node_modules', 'pondus', 'dist', 'cli'));
    expect(cli).toEqual(expect.arrayContaining(['help.cjs', 'help.json', 'mass.cjs', 'calc.cjs']));
    expect(cli.filter((f) => !f.endsWith('.cjs') && f !== 'help.json')).toEqual([]);
    expect(readdirSync(join(dir, 'node_modules', 'pondus'))).toContain('LICENSE');
  });

  it('imports from ESM', () => {
    writeFileSync(join(dir, 'esm.mjs'), "import { formulaMass, getNuclide } from 'pondus';\nconsole.log(formulaMass('CuSO4·5H2O').formula, getNuclide('C', 14).mass);\n");
    // source: AME2020 (14C 14.00324198862 u)
    expect(node(['esm.mjs']).trim()).toBe('CuH10O9S 14.00324198862');
  });

  it('requires from CommonJS', () => {
    writeFileSync(join(dir, 'cjs.cjs'), "const { formulaMass } = require('pondus');\nconsole.log(formulaMass('NaCl').formula);\n");
    expect(node(['cjs.cjs']).trim()).toBe('ClNa');
  });

  it.each([
    ['nodenext', 'esm', 'NodeNext', 'NodeNext'],
    ['node16', 'cjs', 'Node16', 'Node16'],
    ['bundler', 'esm', 'ESNext', 'Bundler'],
  ])('type-checks a strict TypeScript consumer (%s, %s)', (name, kind, module, resolution) => {
    const ext = kind === 'cjs' ? 'cts' : 'mts';
    const src = kind === 'cjs' ? "import pondus = require('pondus');\nconst m: string = pondus.formulaMass('H2O').formula;\nexport { m };\n" : "import { formulaMass, type MassResult } from 'pondus';\nconst r: MassResult = formulaMass('H2O');\nexport const f: string = r.formula;\n";
    writeFileSync(join(dir, `${name}.${ext}`), src);
    // pondus's declarations are checked (--skipLibCheck false); TypeScript's own lib files are not
    // (--skipDefaultLibCheck): checking them is most of the run and says nothing about pondus
    const r = spawnSync(process.execPath, [tsc, '--strict', '--noEmit', '--skipLibCheck', 'false', '--skipDefaultLibCheck', '--module', module, '--moduleResolution', resolution, '--target', 'ES2022', `${name}.${ext}`], { cwd: dir, encoding: 'utf8' });
    expect(r.stdout + r.stderr).toBe('');
    expect(r.status).toBe(0);
  }, 60_000);

  it('runs as a command', () => {
    const version = (JSON.parse(execFileSync(process.execPath, ['-p', 'JSON.stringify(require("./package.json"))'], { cwd: root, encoding: 'utf8' })) as { version: string }).version;
    expect(node([join('node_modules', '.bin', 'pondus'), '--version']).trim()).toBe(version);
    expect(node([join('node_modules', '.bin', 'pondus'), 'mass', '--json', 'H2O'])).toContain('"molarMass":18.015');
    expect(node([join('node_modules', '.bin', 'pondus'), '--help'])).toContain('Usage: pondus [options] [command]');
    expect(node([join('node_modules', '.bin', 'pondus'), 'completion', 'bash'])).toContain('_pondus()');
    // the first run of a bundle wrote its code cache in the (writable) install; the next starts from it
    expect(readdirSync(join(dir, 'node_modules', 'pondus', 'dist', 'cli'))).toContain('mass.cache');
    expect(node([join('node_modules', '.bin', 'pondus'), 'mass', '--json', 'H2O'])).toContain('"molarMass":18.015');
  });
});
