// Builds the library as two self-contained bundles (esbuild → dist/lib/index.js for import,
// dist/lib/index.cjs for require) with its declarations (tsc → dist/types), and the bundled CLI
// (esbuild → dist/cli.cjs), then primes the V8 code cache the CLI starts from.
//
// Why bundles: unbundled, importing the library loads some 500 modules of its parser library's
// dependencies, which takes about half a second; one file loads in a few tens of milliseconds.
import { build } from 'esbuild';
import { execFileSync } from 'node:child_process';
import { copyFileSync, cpSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
rmSync(`${root}dist`, { recursive: true, force: true });
execFileSync(process.execPath, [`${root}node_modules/typescript/bin/tsc`, '-p', `${root}tsconfig.json`, '--emitDeclarationOnly', '--declarationDir', `${root}dist/types`], { stdio: 'inherit' });
// the same declarations serve require(), copied under a folder that TypeScript reads as CommonJS
cpSync(`${root}dist/types`, `${root}dist/types-cjs`, { recursive: true });
writeFileSync(`${root}dist/types-cjs/package.json`, '{ "type": "commonjs" }\n');

// The full AME2020 table (3,557 nuclides) is needed only when a formula names a nuclide outside
// the natural set. The library carries it as a JSON string, parsed on first use, so it reads no
// file and runs wherever JavaScript runs. The CLI, which may touch the file system, reads it from
// dist/data on first use instead (`where` is that folder, from the bundle's): that keeps 115 kB
// out of every start-up.
const lazyNuclideTable = (where) => ({
  name: 'lazy-nuclide-table',
  setup(b) {
    b.onLoad({ filter: /nuclide-masses\.json$/ }, (args) => ({
      contents:
        where === 'embedded'
          ? `const text = ${JSON.stringify(readFileSync(args.path, 'utf8'))};\nlet data;\nexport default { get nuclides() { return (data ??= JSON.parse(text)).nuclides; } };`
          : `let data;\nexport default { get nuclides() { return (data ??= JSON.parse(require('node:fs').readFileSync(require('node:path').join(__dirname, ${JSON.stringify(where)}, 'nuclide-masses.json'), 'utf8'))).nuclides; } };`,
      loader: 'js',
    }));
  },
});
mkdirSync(`${root}dist/data`, { recursive: true });
copyFileSync(`${root}src/elements/data/nuclide-masses.json`, `${root}dist/data/nuclide-masses.json`);

const library = {
  entryPoints: [`${root}src/index.ts`],
  bundle: true,
  platform: 'neutral',
  mainFields: ['module', 'main'],
  target: 'es2022',
  legalComments: 'none',
  external: ['decimal.js'],
  plugins: [lazyNuclideTable('embedded')],
  logLevel: 'warning',
};
await build({ ...library, format: 'esm', outfile: `${root}dist/lib/index.js` });
await build({ ...library, format: 'cjs', outfile: `${root}dist/lib/index.cjs` });

// commander loads node:child_process at start-up but needs it only for
// executable subcommands, which pondus does not have: load it on first use.
const lazyChildProcess = {
  name: 'lazy-child-process',
  setup(b) {
    b.onResolve({ filter: /^(node:)?child_process$/ }, (args) =>
      args.importer.includes('commander') ? { path: 'lazy-child-process', namespace: 'pondus' } : undefined,
    );
    b.onLoad({ filter: /.*/, namespace: 'pondus' }, () => ({
      contents: "let m; module.exports = new Proxy({}, { get: (_, k) => (m ??= require('node:child_process'))[k] });",
      loader: 'js',
    }));
  },
};

// chalk's terminal detection loads node:tty at start-up; pondus decides the
// colour level itself (styleFor), so the dependency-free variant is enough.
const plainSupportsColor = {
  name: 'plain-supports-color',
  setup(b) {
    b.onResolve({ filter: /^#supports-color$/ }, () => ({ path: `${root}node_modules/chalk/source/vendor/supports-color/browser.js` }));
  },
};

await build({
  entryPoints: [`${root}src/cli/run.ts`],
  outfile: `${root}dist/cli.cjs`,
  bundle: true,
  platform: 'node',
  format: 'cjs',
  target: 'node20',
  minifyWhitespace: true,
  minifySyntax: true,
  minifyIdentifiers: !process.env.PONDUS_NO_MINIFY,
  legalComments: 'none',
  plugins: [lazyChildProcess, plainSupportsColor, lazyNuclideTable('data')],
  logLevel: 'warning',
});

// The same CLI with its `main(argv, io)` exported, for the fuzz harness, which runs it in a
// worker thread it can stop when an input hangs.
await build({
  entryPoints: [`${root}src/cli/main.ts`],
  outfile: `${root}dist/test/cli-main.cjs`,
  bundle: true,
  platform: 'node',
  format: 'cjs',
  target: 'node20',
  plugins: [lazyNuclideTable('../data')],
  logLevel: 'warning',
});

// Run the CLI once so the loader saves V8's compiled code next to the bundle.
execFileSync(process.execPath, [`${root}bin/pondus.cjs`, 'mass', 'H2O'], { env: { ...process.env, PONDUS_WRITE_CODE_CACHE: '1' }, stdio: 'ignore' });
