// Runs pondus's CLI (the bundle built for tests, dist/test/cli-main.cjs) in a worker thread.
// Each request { id, args, input, env } gets { id, status, stdout, stderr, ms } back. Two ways in:
// - with workerData { port, flag } (tests/cli/run-cli.ts): answers on that port and wakes the
//   test thread, which waits on the shared flag;
// - without (the fuzz harness): answers on parentPort, also to a batch of requests sent at once;
//   the harness replaces a worker that hangs.
'use strict';
const { parentPort, workerData } = require('node:worker_threads');
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

async function serve({ id, args, input, env = {} }) {
  const saved = {};
  for (const [k, v] of Object.entries(env)) {
    saved[k] = process.env[k];
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
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
  } finally {
    for (const [k, v] of Object.entries(saved)) {
      if (v === undefined) delete process.env[k];
      else process.env[k] = v;
    }
  }
  return { id, status, stdout: stdout.text, stderr: stderr.text, ms: performance.now() - t0 };
}

if (workerData && workerData.port) {
  const { port, flag } = workerData;
  const signal = new Int32Array(flag);
  port.on('message', async (request) => {
    port.postMessage(await serve(request));
    Atomics.store(signal, 0, 1);
    Atomics.notify(signal, 0);
  });
} else {
  // one request at a time, in order; a batch { batch: [request…] } answers each request as it ends,
  // with a turn of the event loop between two runs as between two separate requests
  let queue = Promise.resolve();
  parentPort.on('message', (message) => {
    queue = queue.then(async () => {
      for (const request of message.batch ?? [message]) {
        parentPort.postMessage(await serve(request));
        await new Promise((resolve) => setImmediate(resolve));
      }
    });
  });
}
