// Runs the compiler over the type tests (tests/types/*.test-d.ts), so that `npm test` fails when a
// public type changes under them. The type tests hold wrong assertions marked @ts-expect-error, so
// the check also fails if expectTypeOf ever stopped catching a mismatch. The type tests import the
// declarations the build emitted (dist/types: npm test builds first, and the build's compiler run
// is the type check of src/), so this run checks them and not all of src/ a second time.
import { spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
const tsc = (project: string) => spawnSync(process.execPath, [join(root, 'node_modules/typescript/bin/tsc'), '-p', project], { encoding: 'utf8' });

describe('type tests of the public API', () => {
  it('tests/types/*.test-d.ts type-check', () => {
    const r = tsc(join(root, 'tests/types/tsconfig.json'));
    expect(r.stdout + r.stderr).toBe('');
    expect(r.status).toBe(0);
  }, 60_000);
});
