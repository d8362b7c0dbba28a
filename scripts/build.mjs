// Builds the library (tsc → dist/lib, with types) and the bundled CLI
// (esbuild → dist/cli.cjs), then primes the V8 code cache the CLI starts from.
import { build } from 'esbuild';
import { execFileSync } from 'node:child_process';
import { cpSync, mkdirSync, rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
rmSync(`${root}dist`, { recursive: true, force: true });
execFileSync(process.execPath, [`${root}node_modules/typescript/bin/tsc`, '-p', `${root}tsconfig.json`], { stdio: 'inherit' });

// The full nuclide table is read at run time, only when a formula needs it.
for (const dir of ['dist/data', 'dist/lib/elements/data']) {
  mkdirSync(`${root}${dir}`, { recursive: true });
  cpSync(`${root}src/elements/data/nuclide-masses.json`, `${root}${dir}/nuclide-masses.json`);
}

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
  define: { 'import.meta.url': '__pondusUrl' },
  banner: { js: "const __pondusUrl = require('node:url').pathToFileURL(__filename).href;" },
  plugins: [lazyChildProcess, plainSupportsColor],
  logLevel: 'warning',
});

// Run the CLI once so the loader saves V8's compiled code next to the bundle.
execFileSync(process.execPath, [`${root}bin/pondus.cjs`, 'mass', 'H2O'], { env: { ...process.env, PONDUS_WRITE_CODE_CACHE: '1' }, stdio: 'ignore' });
