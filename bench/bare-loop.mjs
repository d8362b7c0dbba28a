// The baseline the batch benchmark compares against: a bare Node loop that
// reads the same lines and writes one JSON object per line, with the same
// keys as `pondus mass --json` but no chemistry (the input echoed, lengths
// for numbers). Same reading and writing scheme as the CLI.
process.stdin.setEncoding('utf8');
let rest = '';
for await (const chunk of process.stdin) {
  const lines = (rest + chunk).split('\n');
  rest = lines.pop();
  let out = '';
  for (const l of lines) {
    out += JSON.stringify({ input: l, formula: l, molarMass: l.length, monoisotopicMass: l.length, nominalMass: l.length, charge: 0 }) + '\n';
  }
  if (!process.stdout.write(out)) await new Promise((r) => process.stdout.once('drain', r));
}
