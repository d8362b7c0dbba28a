import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { MessageChannel, receiveMessageOnPort, Worker, type MessagePort } from 'node:worker_threads';

const BIN = fileURLToPath(new URL('../../bin/pondus.cjs', import.meta.url));
const WORKER = fileURLToPath(new URL('../support/cli-worker.cjs', import.meta.url));
const TIMEOUT_MS = 60_000;

export interface CliRun {
  status: number | null;
  stdout: string;
  stderr: string;
}

let worker: { worker: Worker; port: MessagePort; signal: Int32Array } | null = null;

function start() {
  if (worker) return worker;
  const { port1, port2 } = new MessageChannel();
  const flag = new SharedArrayBuffer(4);
  const w = new Worker(WORKER, { workerData: { port: port2, flag }, transferList: [port2] });
  w.unref();
  worker = { worker: w, port: port1, signal: new Int32Array(flag) };
  return worker;
}

/**
 * Runs the built CLI (npm test builds it first) with arguments and optional standard input, as a
 * user would and with the same output, but in a worker thread of this process: the test waits for
 * the answer, so each run costs about a millisecond instead of a Node start-up.
 */
export function pondus(args: string[], input?: string, env: Record<string, string> = {}): CliRun {
  const w = start();
  Atomics.store(w.signal, 0, 0);
  w.port.postMessage({ args, input: input ?? '', env: { NO_COLOR: '1', ...env } });
  const deadline = Date.now() + TIMEOUT_MS;
  // the worker posts its answer, then raises the flag; a flag raised with no answer on the port
  // yet (or left from before) is lowered and waited on again, until the answer or the deadline
  for (;;) {
    const reply = receiveMessageOnPort(w.port);
    if (reply) return reply.message as CliRun;
    const left = deadline - Date.now();
    if (left <= 0) break;
    if (Atomics.wait(w.signal, 0, 0, left) === 'not-equal') Atomics.store(w.signal, 0, 0);
  }
  void w.worker.terminate();
  worker = null;
  return { status: null, stdout: '', stderr: `pondus did not answer within ${TIMEOUT_MS} ms` };
}

/** Runs the CLI as its own process through bin/pondus.cjs: for the few tests of the process itself. */
export function pondusProcess(args: string[], input?: string, env: Record<string, string> = {}): CliRun {
  const r = spawnSync(process.execPath, [BIN, ...args], { input: input ?? '', encoding: 'utf8', env: { ...process.env, NO_COLOR: '1', ...env }, maxBuffer: 256 * 1024 * 1024 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

export const jsonLines = (s: string) => s.trim().split('\n').map((l) => JSON.parse(l));
