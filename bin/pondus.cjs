#!/usr/bin/env node
'use strict';
// Starts the command line. It comes in bundles (dist/cli/<name>.cjs, built from src/cli/bundles/),
// one per command module, so that a command loads only its own code; `help` has every command
// declared and none of their code (help, completion, manual, and anything else).
// `--version` is answered here, and so are `--help` and `<command> --help` off a terminal, from the
// help texts the build wrote with the program itself (dist/cli/help.json). (CommonJS on purpose:
// it starts faster.)
//
// A bundle starts from V8's code cache when one is beside it (dist/cli/<name>.cache), which saves
// compiling it; any problem with the cache falls back to a plain compile. The cache is valid for
// one Node build only, so the package does not ship it: it is written on the first run of each
// bundle (or when V8 rejects it, after a Node upgrade), where the folder is writable. The formula
// and calculator grammars, with their parser library, are a file of their own
// (dist/cli/grammars.cjs), which a bundle loads the same way when an input first needs them; so is
// the CSV reader of sheets (dist/cli/sheet-reader.cjs), loaded when a sheet is first read.
const BUNDLE = {
  mass: 'mass',
  composition: 'composition',
  calc: 'calc',
  analysis: 'analysis',
  empirical: 'empirical',
  combustion: 'combustion',
  candidates: 'candidates',
  balance: 'balance',
  react: 'react',
  reagents: 'reagents',
  prepare: 'prepare',
  dilute: 'conversions',
  gravimetric: 'conversions',
  basis: 'conversions',
  salt: 'conversions',
  titration: 'qc',
  standardise: 'qc',
  'sample-basis': 'qc',
  replicates: 'qc',
  meq: 'pharmacy',
  osmolarity: 'pharmacy',
  alligation: 'pharmacy',
  potency: 'pharmacy',
  strength: 'pharmacy',
  ion: 'ion',
  pattern: 'ion',
};

const args = process.argv.slice(2);
const first = args[0];
const isHelp = (a) => a === '--help' || a === '-h';
// the help asked for: '' for the program's, a command's name for its own
const helpOf = args.length === 1 && isHelp(first) ? '' : args.length === 2 && isHelp(args[1]) && Object.hasOwn(BUNDLE, first) ? first : undefined;

/** Writes text to standard output (at once where it can: a file, or a pipe with room). */
function writeNow(text) {
  const { writeSync } = require('node:fs');
  let buf = Buffer.from(text);
  try {
    while (buf.length > 0) buf = buf.subarray(writeSync(1, buf));
  } catch (e) {
    if (e.code === 'EAGAIN') process.stdout.write(buf); // a full pipe: the rest when it drains
    else if (e.code !== 'EPIPE') throw e; // EPIPE: the reader stopped reading (| head)
  }
}

let texts;
if (helpOf !== undefined && !require('node:tty').isatty(1)) {
  try {
    texts = JSON.parse(require('node:fs').readFileSync(require('node:path').join(__dirname, '..', 'dist', 'cli', 'help.json'), 'utf8'));
  } catch {
    texts = undefined; // no help texts: the help bundle answers
  }
}
if (args.length === 1 && (first === '--version' || first === '-V')) {
  writeNow(`${require('../package.json').version}\n`);
} else if (texts !== undefined && typeof texts[helpOf] === 'string') {
  writeNow(texts[helpOf]);
} else {
  const { closeSync, fstatSync, openSync, readSync, writeFileSync } = require('node:fs');
  const { join } = require('node:path');
  const { Script } = require('node:vm');
  const dir = join(__dirname, '..', 'dist', 'cli');
  // Runs dist/cli/<name>.cjs as a CommonJS module, from its code cache where there is one, and
  // returns its exports. A bundle's require of './grammars.cjs' (the grammars, on first use) or of
  // './sheet-reader.cjs' (the CSV reader, when a sheet is first read) comes here too, so that file
  // starts from its own cache.
  const load = (name) => {
    const file = join(dir, `${name}.cjs`);
    const cacheFile = join(dir, `${name}.cache`);
    // The file is the function CommonJS would wrap a module in (the build writes it so), in ASCII.
    // It and its cache are read through one buffer: the text first, copied into a string, then the
    // cache over it. Memory first touched costs start-up a page fault per 4 kB, and a second buffer
    // for the text was some 60 of them.
    const textFd = openSync(file, 'r');
    let cacheFd;
    try {
      cacheFd = openSync(cacheFile, 'r');
    } catch {
      cacheFd = undefined; // no cache yet
    }
    const textSize = fstatSync(textFd).size;
    let cacheSize = 0;
    if (cacheFd !== undefined) {
      const stat = fstatSync(cacheFd);
      if (stat.isFile()) cacheSize = stat.size;
      else {
        closeSync(cacheFd); // not a file (a folder in its place): start without a cache
        cacheFd = undefined;
      }
    }
    const buf = Buffer.allocUnsafeSlow(Math.max(textSize, cacheSize));
    const readAll = (fd, size) => {
      let at = 0;
      while (at < size) {
        const n = readSync(fd, buf, at, size - at, at);
        if (n === 0) break;
        at += n;
      }
      closeSync(fd);
      return at;
    };
    const text = buf.latin1Slice(0, readAll(textFd, textSize));
    let cachedData;
    try {
      cachedData = cacheFd === undefined ? undefined : buf.subarray(0, readAll(cacheFd, cacheSize));
    } catch {
      cachedData = undefined; // a cache that cannot be read: compile afresh
    }
    let script;
    try {
      script = new Script(text, { filename: file, cachedData });
    } catch {
      cachedData = undefined; // a cache V8 cannot even read: compile afresh (and write it anew)
      script = new Script(text, { filename: file });
    }
    const mod = { exports: {}, filename: file, id: file, loaded: false };
    // a bundle requires Node's own modules and the two files above, nothing else: this file's
    // require serves them (a file's own require, from node:module, cost half a millisecond to load)
    const bundleRequire = (id) => (id === './grammars.cjs' ? load('grammars') : id === './sheet-reader.cjs' ? load('sheet-reader') : require(id.startsWith('.') ? join(dir, id) : id));
    script.runInThisContext()(mod.exports, bundleRequire, mod, file, dir);
    if (cachedData === undefined || script.cachedDataRejected || process.env.PONDUS_WRITE_CODE_CACHE) {
      process.on('exit', () => {
        try {
          writeFileSync(cacheFile, script.createCachedData());
        } catch {
          // a read-only install: start without a cache
        }
      });
    }
    return mod.exports;
  };
  load(Object.hasOwn(BUNDLE, first) ? BUNDLE[first] : 'help');
}
