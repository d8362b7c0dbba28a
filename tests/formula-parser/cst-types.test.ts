// The CST types of the formula grammar (src/formula-parser/cst.ts) are generated from the grammar
// by Chevrotain's generateCstDts, and must stay current: after changing the grammar, run
//   UPDATE_CST_TYPES=1 npx vitest run tests/formula-parser/cst-types.test.ts
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { generateCstDts } from 'chevrotain';
import { describe, expect, it } from 'vitest';
import { formulaGrammar } from '../../src/formula-parser/grammar.js';

const FILE = fileURLToPath(new URL('../../src/formula-parser/cst.ts', import.meta.url));
const HEADER = [
  '// Generated from the formula grammar (grammar.ts) by Chevrotain\'s generateCstDts: do not edit.',
  '// tests/formula-parser/cst-types.test.ts checks it is current (UPDATE_CST_TYPES=1 rewrites it).',
  '/* eslint-disable */',
  '',
].join('\n');

describe('the CST types of the formula grammar', () => {
  it('are the ones the grammar generates', () => {
    const generated = HEADER + generateCstDts(formulaGrammar().getGAstProductions(), { includeVisitorInterface: true, visitorInterfaceName: 'FormulaCstVisitor' });
    if (process.env.UPDATE_CST_TYPES) writeFileSync(FILE, generated);
    expect(readFileSync(FILE, 'utf8')).toBe(generated);
  });
});
