// The floor under every batch figure: read the lines and write each one back, no JSON at all.
process.stdin.setEncoding('utf8');
let rest = '';
for await (const chunk of process.stdin) {
  const lines = (rest + chunk).split('\n');
  rest = lines.pop();
  let out = '';
  for (const l of lines) out += l + '\n';
  if (!process.stdout.write(out)) await new Promise((r) => process.stdout.once('drain', r));
}
