import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const BIN = fileURLToPath(new URL('../../bin/pondus.cjs', import.meta.url));

export interface CliRun {
  status: number | null;
  stdout: string;
  stderr: string;
}

/** Runs the built CLI (npm test builds it first) with arguments and optional standard input. */
export function pondus(args: string[], input?: string, env: Record<string, string> = {}): CliRun {
  const r = spawnSync(process.execPath, [BIN, ...args], { input: input ?? '', encoding: 'utf8', env: { ...process.env, NO_COLOR: '1', ...env }, maxBuffer: 256 * 1024 * 1024 });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

export const jsonLines = (s: string) => s.trim().split('\n').map((l) => JSON.parse(l));
