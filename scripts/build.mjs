// Builds the library as two self-contained bundles (esbuild → dist/lib/index.js for import,
// dist/lib/index.cjs for require) with its declarations (tsc → dist/types), and the command line in
// bundles (esbuild → dist/cli/*.cjs, started by bin/pondus.cjs) with its help texts, then primes
// the V8 code cache each bundle starts from.
//
// Why bundles: unbundled, importing the library loads some 500 modules of its parser library's
// dependencies, which takes about half a second; one file loads in a few tens of milliseconds.
import { build } from 'esbuild';
import { execFileSync } from 'node:child_process';
import { copyFileSync, cpSync, mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Writable } from 'node:stream';
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
// The other data tables (atomic weights, natural isotopes, constants) are read at start-up, but as
// JSON text parsed then, not as object literals: V8 puts every string a literal names (each
// abundance, mass and name, some 1,400 of them) in its table of internalized strings, and a bundle
// that takes that table past its size at Node's own start-up pays some 2 ms to grow it. The values
// JSON.parse makes are plain strings; only the text itself is internalized.
const dataAsJsonText = {
  name: 'data-as-json-text',
  setup(b) {
    b.onLoad({ filter: /elements[\\/]data[\\/](atomic-weights|isotopes|constants)\.json$/ }, (args) => {
      const compact = JSON.stringify(JSON.parse(readFileSync(args.path, 'utf8')));
      return { contents: `export default JSON.parse('${compact.replace(/\\/g, '\\\\').replace(/'/g, "\\'")}');`, loader: 'js' };
    });
  },
};
mkdirSync(`${root}dist/data`, { recursive: true });
copyFileSync(`${root}src/elements/data/nuclide-masses.json`, `${root}dist/data/nuclide-masses.json`);

// The formula and calculator grammars (Chevrotain's tokens and parser classes) are built at
// start-up by any module that imports them, though the fast readers take most inputs. Each build
// swaps formula-parser/grammar-loader.ts and calc/grammar-loader.ts for modules that load their
// grammar on first use, `where` from:
// - 'inline' (the library): full-grammar.ts inside the same file, which esbuild wraps in a lazy
//   initialiser, so importing the library does not make the tokens and parser classes;
// - 'own file' (the command line): dist/cli/grammars.cjs (built from src/cli/grammar-chunk.ts),
//   so the parser library, about 40 % of a bundle, is neither read nor compiled by a command
//   whose inputs the fast readers take.
const lazyGrammar = (where) => ({
  name: 'lazy-grammar',
  setup(b) {
    const loader = (fn, dir, part) => ({
      contents: `let full;\nexport function ${fn}() { return (full ??= ${where === 'inline' ? "require('./full-grammar.ts')" : `require('./grammars.cjs').${part}`}); }\n`,
      loader: 'ts',
      resolveDir: `${root}src/${dir}`,
    });
    if (where !== 'inline') b.onResolve({ filter: /^\.\/grammars\.cjs$/ }, () => ({ path: './grammars.cjs', external: true }));
    b.onLoad({ filter: /formula-parser[\\/]grammar-loader\.ts$/ }, () => loader('fullGrammar', 'formula-parser', 'formula'));
    b.onLoad({ filter: /calc[\\/]grammar-loader\.ts$/ }, () => loader('calcFullGrammar', 'calc', 'calc'));
  },
});

// The same for the CSV reader of sheets in the command line: a bundle requires
// './sheet-reader.cjs' when a sheet is first read (about 28 kB a command given no sheet does not
// compile at start-up).
const lazySheetReader = {
  name: 'lazy-sheet-reader',
  setup(b) {
    b.onResolve({ filter: /^\.\/sheet-reader\.cjs$/ }, () => ({ path: './sheet-reader.cjs', external: true }));
    b.onResolve({ filter: /^csv-parse\/sync$/ }, (args) => (/sheets[\\/]read-sheet\.ts$/.test(args.importer) ? { path: 'lazy-sheet-reader', namespace: 'pondus-sheet' } : undefined));
    b.onLoad({ filter: /.*/, namespace: 'pondus-sheet' }, () => ({
      contents: "let m;\nexport function parse(text, options) { return (m ??= require('./sheet-reader.cjs')).parse(text, options); }\n",
      loader: 'js',
    }));
  },
};

const library = {
  entryPoints: [`${root}src/index.ts`],
  bundle: true,
  platform: 'neutral',
  mainFields: ['module', 'main'],
  target: 'es2022',
  legalComments: 'none',
  external: ['decimal.js'],
  minifyWhitespace: true,
  minifySyntax: true,
  plugins: [lazyNuclideTable('embedded'), dataAsJsonText, lazyGrammar('inline')],
  logLevel: 'warning',
};
await build({ ...library, format: 'esm', outfile: `${root}dist/lib/index.js` });
await build({ ...library, format: 'cjs', outfile: `${root}dist/lib/index.cjs` });

// esbuild writes strings in ASCII but leaves regular expressions as written, and one character
// past ASCII ('·' in a pattern) makes Node read the whole file as a two-byte string: twice the
// memory, and a slower read and compile. Each such character becomes its \uXXXX escape, which
// means the same in a pattern, a string or a comment.
function asciiOnly(file) {
  const text = readFileSync(file, 'utf8');
  const out = text.replace(/(\\*)([^\x00-\x7f])/g, (_, slashes, c) => {
    // an escaped character ('\·') would turn into an escaped backslash: refuse rather than guess
    if (slashes.length % 2 === 1) throw new Error(`${file}: an escaped non-ASCII character (${JSON.stringify(slashes + c)}): write it as \\u${c.charCodeAt(0).toString(16).padStart(4, '0')} in the source`);
    return `${slashes}\\u${c.charCodeAt(0).toString(16).padStart(4, '0')}`;
  });
  if (out !== text) writeFileSync(file, out);
}
asciiOnly(`${root}dist/lib/index.js`);
asciiOnly(`${root}dist/lib/index.cjs`);

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

// The command line, in parts: one bundle per command module (src/cli/bundles/<name>.ts →
// dist/cli/<name>.cjs), each holding only what its commands use, and `help`, with every command
// declared and none of their code (help, completion, manual). bin/pondus.cjs picks the bundle by
// the command's name. They share nothing: a command loads its own code and no other's.
const bundles = readdirSync(`${root}src/cli/bundles`).filter((f) => f.endsWith('.ts')).map((f) => f.slice(0, -3));
const cliFile = {
  bundle: true,
  platform: 'node',
  format: 'cjs',
  target: 'node20',
  minifyWhitespace: !process.env.PONDUS_NO_MINIFY, // PONDUS_NO_MINIFY=1 keeps names and layout, for profiles
  minifySyntax: true,
  minifyIdentifiers: !process.env.PONDUS_NO_MINIFY,
  legalComments: 'none',
  logLevel: 'warning',
};
const cli = await build({
  ...cliFile,
  entryPoints: bundles.map((b) => `${root}src/cli/bundles/${b}.ts`),
  outdir: `${root}dist/cli`,
  outExtension: { '.js': '.cjs' },
  metafile: true,
  plugins: [lazyChildProcess, lazyNuclideTable('../data'), dataAsJsonText, lazyGrammar('own file'), lazySheetReader],
});
// the grammars' own file, which the bundles above require on first use
await build({ ...cliFile, entryPoints: [`${root}src/cli/grammar-chunk.ts`], outfile: `${root}dist/cli/grammars.cjs` });
// and the sheet reader's
await build({ ...cliFile, entryPoints: [`${root}src/cli/sheet-reader-chunk.ts`], outfile: `${root}dist/cli/sheet-reader.cjs` });
if (process.env.PONDUS_METAFILE) writeFileSync(process.env.PONDUS_METAFILE, JSON.stringify(cli.metafile));
for (const f of readdirSync(`${root}dist/cli`)) if (f.endsWith('.cjs')) asciiOnly(`${root}dist/cli/${f}`);
// Each bundle is written as the function CommonJS would wrap it in, so that bin/pondus.cjs compiles
// the file's text as it is read: wrapping it at start-up made a second copy of a 200 kB string,
// which start-up then paid for in memory touched and a collection of the young heap.
const WRAP_HEAD = '(function (exports, require, module, __filename, __dirname) { ';
for (const f of readdirSync(`${root}dist/cli`)) {
  if (!f.endsWith('.cjs')) continue;
  const text = readFileSync(`${root}dist/cli/${f}`, 'latin1');
  if (!text.startsWith(WRAP_HEAD)) writeFileSync(`${root}dist/cli/${f}`, `${WRAP_HEAD}${text}\n});`, 'latin1');
}
// the help bundle must stay free of the chemistry: it is what `pondus --help` loads
const helpInputs = Object.keys(cli.metafile.outputs[Object.keys(cli.metafile.outputs).find((o) => o.endsWith('/help.cjs'))].inputs);
// (search-defaults.ts is plain data the options' defaults come from, and imports nothing)
const heavy = helpInputs.filter((i) => !/^(src\/cli\/|src\/errors\/|src\/empirical\/search-defaults\.ts$|node_modules\/commander\/|pondus:)/.test(i));
if (heavy.length) throw new Error(`the help bundle (dist/cli/help.cjs) loads code it does not need: ${heavy.join(', ')}`);
// and no command bundle holds the parser library: the grammars' file has it, loaded on first use
for (const [out, o] of Object.entries(cli.metafile.outputs)) {
  const parserLibrary = Object.keys(o.inputs).filter((i) => /node_modules\/(@?chevrotain|lodash)/.test(i));
  if (parserLibrary.length) throw new Error(`${out} holds the parser library, which belongs in dist/cli/grammars.cjs: ${parserLibrary.slice(0, 3).join(', ')}`);
  const sheetReader = Object.keys(o.inputs).filter((i) => /node_modules\/csv-parse/.test(i));
  if (sheetReader.length) throw new Error(`${out} holds the CSV reader, which belongs in dist/cli/sheet-reader.cjs: ${sheetReader.slice(0, 3).join(', ')}`);
}

// The same CLI with its `main(argv, io)` exported, for the fuzz harness, which runs it in a
// worker thread it can stop when an input hangs.
await build({
  entryPoints: [`${root}src/cli/main.ts`],
  outfile: `${root}dist/test/cli-main.cjs`,
  bundle: true,
  platform: 'node',
  format: 'cjs',
  target: 'node20',
  plugins: [lazyNuclideTable('../data'), dataAsJsonText],
  logLevel: 'warning',
});

// `pondus --help` and `pondus <command> --help` on a pipe or file (not a terminal, where the help
// is wrapped to its width) are printed by bin/pondus.cjs from dist/cli/help.json, without starting
// any bundle: the texts are written here by the full program itself (commander's help at the
// 80 columns it uses off a terminal), so they are the help, not a copy kept by hand.
const { main } = createRequire(import.meta.url)(`${root}dist/test/cli-main.cjs`);
async function helpText(args) {
  let text = '';
  const sink = () => new Writable({ write(chunk, _enc, done) { text += chunk; done(); } });
  const status = await main(args, { stdin: () => [], stdout: sink(), stderr: new Writable({ write(_c, _e, done) { done(); } }) });
  if (status !== 0) throw new Error(`pondus ${args.join(' ')} exited ${status}`);
  return text;
}
const top = await helpText(['--help']);
const commands = top.slice(top.indexOf('\nCommands:\n')).split('\n').map((l) => /^  ([a-z][a-z0-9-]*)\b/.exec(l)?.[1]).filter((c) => c && c !== 'help');
// every command of the program has its bundle in bin/pondus.cjs's table (or is one of help's own)
const binText = readFileSync(`${root}bin/pondus.cjs`, 'utf8');
const table = new Function(`return ${/const BUNDLE = (\{[\s\S]*?\});/.exec(binText)[1]}`)();
const missing = commands.filter((c) => !Object.hasOwn(table, c) && c !== 'completion' && c !== 'manual');
if (missing.length) throw new Error(`bin/pondus.cjs has no bundle for ${missing.join(', ')}`);
const unknown = [...new Set(Object.values(table))].filter((b) => !bundles.includes(b));
if (unknown.length) throw new Error(`bin/pondus.cjs names bundles that are not built: ${unknown.join(', ')}`);
const help = { '': top };
for (const c of commands) help[c] = await helpText([c, '--help']);
writeFileSync(`${root}dist/cli/help.json`, JSON.stringify(help));
// dist/cli.cjs, where the one-file command line used to be, starts it the same way as bin/pondus.cjs
writeFileSync(`${root}dist/cli.cjs`, "'use strict';\n// Starts the pondus command line (see bin/pondus.cjs).\nrequire('../bin/pondus.cjs');\n");

// Run each bundle once so the loader saves V8's compiled code next to it (the first example of its
// first command, or for help, the help of the program and the completion script).
const examples = createRequire(import.meta.url)(`${root}dist/test/cli-main.cjs`).HELP_EXAMPLES;
const words = (line) => [...line.matchAll(/'([^']*)'|(\S+)/g)].map((m) => m[1] ?? m[2]).slice(1);
for (const b of bundles) {
  const first = Object.keys(table).find((c) => table[c] === b);
  const runs = b === 'help' ? [['completion', 'bash'], ['help', 'mass']] : [words(examples[first][0])];
  for (const args of runs) execFileSync(process.execPath, [`${root}bin/pondus.cjs`, ...args], { cwd: root, env: { ...process.env, PONDUS_WRITE_CODE_CACHE: '1' }, stdio: 'ignore' });
}
// and the grammars' file last (each run above that needed it wrote its cache): a run that reads a
// formula and an expression through both grammars
execFileSync(process.execPath, [`${root}bin/pondus.cjs`, 'calc', '(2.0 g + 1.0 g) / M(Ca(OH)2)'], { cwd: root, env: { ...process.env, PONDUS_WRITE_CODE_CACHE: '1' }, stdio: 'ignore' });
// and the sheet reader's: a run that reads the example lab sheet
execFileSync(process.execPath, [`${root}bin/pondus.cjs`, 'analysis', '--sheet', `${root}examples/ea-lab-sheet.csv`, '--json'], { cwd: root, env: { ...process.env, PONDUS_WRITE_CODE_CACHE: '1' }, stdio: 'ignore' });
