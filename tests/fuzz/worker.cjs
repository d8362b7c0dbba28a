// Runs pondus's CLI (the bundle built for tests) for each message { args, input } and answers
// { status, stdout, stderr, ms }. The harness stops and replaces this worker when a run hangs.
'use strict';
const { parentPort } = require('node:worker_threads');
const { Writable } = require('node:stream');
const { join } = require('node:path');
const { main } = require(join(__dirname, '..', '..', 'dist', 'test', 'cli-main.cjs'));

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

parentPort.on('message', async ({ id, args, input }) => {
  const stdout = new Capture();
  const stderr = new Capture();
  const t0 = performance.now();
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
    status = -1;
    stderr.text += `thrown out of main: ${e && e.stack ? e.stack : String(e)}`;
  }
  parentPort.postMessage({ id, status, stdout: stdout.text, stderr: stderr.text, ms: performance.now() - t0 });
});
