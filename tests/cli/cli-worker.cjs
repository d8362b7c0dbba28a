// Runs pondus's CLI (the bundle built for tests, dist/test/cli-main.cjs) in a worker thread for
// run-cli.ts: each request { args, input, env } gets { status, stdout, stderr } back on the port,
// and the waiting test thread is woken through the shared flag.
'use strict';
const { workerData } = require('node:worker_threads');
const { Writable } = require('node:stream');
const { join } = require('node:path');
const { main } = require(join(__dirname, '..', '..', 'dist', 'test', 'cli-main.cjs'));

const { port, flag } = workerData;
const signal = new Int32Array(flag);

class Capture extends Writable {
  constructor() {
    super();
    this.text = '';
    this.isTTY = false;
  }
  _write(chunk, _enc, done) {
    this.text += typeof chunk === 'string' ? chunk : chunk.toString('utf8');
    done();
  }
}

async function serve({ args, input, env }) {
  const saved = {};
  for (const [k, v] of Object.entries(env)) {
    saved[k] = process.env[k];
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
  const stdout = new Capture();
  const stderr = new Capture();
  let status;
  try {
    status = await main(args, {
      stdin: () =>
        (async function* () {
          if (input) yield input;
        })(),
      stdout,
      stderr,
    });
  } catch (e) {
    status = 70;
    stderr.text += `thrown out of main: ${e && e.stack ? e.stack : String(e)}`;
  } finally {
    for (const [k, v] of Object.entries(saved)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  }
  return { status, stdout: stdout.text, stderr: stderr.text };
}

port.on('message', async (request) => {
  const result = await serve(request);
  port.postMessage(result);
  Atomics.store(signal, 0, 1);
  Atomics.notify(signal, 0);
});
