#!/usr/bin/env node
'use strict';
// Starts the bundled CLI (dist/cli.cjs) from V8's code cache when one is there,
// which saves compiling the bundle on every start. Any problem with the cache
// falls back to a plain require. (CommonJS on purpose: it starts faster.)
// The cache is valid for one Node build only, so the package does not ship it:
// it is written beside the bundle on the first run (or when V8 rejects it, after
// a Node upgrade), where the folder is writable; elsewhere the CLI just compiles.
const { readFileSync, writeFileSync } = require('node:fs');
const Module = require('node:module');
const { dirname, join } = require('node:path');
const { Script } = require('node:vm');

const file = join(__dirname, '..', 'dist', 'cli.cjs');
const cacheFile = join(__dirname, '..', 'dist', 'cli.cache');

let cachedData;
try {
  cachedData = readFileSync(cacheFile);
} catch {
  cachedData = undefined;
}
let script;
try {
  script = new Script(Module.wrap(readFileSync(file, 'utf8')), { filename: file, cachedData });
} catch {
  script = undefined;
}
if (script) {
  const mod = { exports: {}, filename: file, id: file, loaded: false };
  script.runInThisContext()(mod.exports, Module.createRequire(file), mod, file, dirname(file));
  if (cachedData === undefined || script.cachedDataRejected || process.env.PONDUS_WRITE_CODE_CACHE) {
    process.on('exit', () => {
      try {
        writeFileSync(cacheFile, script.createCachedData());
      } catch {
        // a read-only install: start without a cache
      }
    });
  }
} else {
  require(file);
}
