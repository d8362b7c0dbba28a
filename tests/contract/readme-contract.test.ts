import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
// @ts-expect-error: a plain ESM script without type declarations
import { BEGIN, END, contractTables } from '../../scripts/json-contract.mjs';

describe("the README's JSON contract", () => {
  it('holds exactly the tables generated from the schemas (node scripts/json-contract.mjs --write)', () => {
    const readme = readFileSync(new URL('../../README.md', import.meta.url), 'utf8');
    const a = readme.indexOf(BEGIN as string);
    const b = readme.indexOf(END as string);
    expect(a).toBeGreaterThan(0);
    expect(readme.slice(a + (BEGIN as string).length, b).trim()).toBe((contractTables as () => string)().trim());
  });
});
