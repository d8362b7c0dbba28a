// Timing one batch run of a command: wall time and peak resident memory.
import { closeSync, openSync, readFileSync } from 'node:fs';
import { spawn } from 'node:child_process';

/** The median of a list of numbers. */
export const median = (a) => [...a].sort((x, y) => x - y)[a.length >> 1];
const ms = (t0) => Number(process.hrtime.bigint() - t0) / 1e6;

/** Runs `node …args` with a file on standard input; returns wall time and peak memory (VmHWM from /proc, sampled). */
export function timeBatch(args, file) {
  return new Promise((resolve, reject) => {
    const fd = openSync(file, 'r');
    const t0 = process.hrtime.bigint();
    const child = spawn(process.execPath, args, { stdio: [fd, 'ignore', 'ignore'] });
    let peak = 0;
    const sample = () => {
      try {
        const m = /VmHWM:\s+(\d+)/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'));
        if (m) peak = Math.max(peak, Number(m[1]));
      } catch {
        /* the process has ended */
      }
    };
    const timer = setInterval(sample, 20);
    child.on('exit', (code) => {
      clearInterval(timer);
      closeSync(fd);
      if (code !== 0 && code !== 1) reject(new Error(`${args.join(' ')} exited ${code}`));
      else resolve({ ms: ms(t0), peakMB: peak / 1024 });
    });
  });
}
