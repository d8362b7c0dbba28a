// A notebook-style script: runs every pondus command with --json and --csv, reads the rows back
// and prints what a script would see. Run from the project folder after `npm ci`:
//   node examples/notebook/read-every-command.mjs
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';

const commands = JSON.parse(readFileSync(new URL('./commands.json', import.meta.url), 'utf8'));
const run = (args) => {
  try {
    return execFileSync(process.execPath, ['bin/pondus.cjs', ...args], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] });
  } catch (e) {
    return e.stdout; // exit 1: some input failed; its row is in the output like the others
  }
};
// RFC 4180 records: quoted cells may hold commas, quotes and line ends
function csvRows(text) {
  const rows = [];
  let row = [], cell = '', quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') (cell += '"'), i++;
      else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') row.push(cell), (cell = '');
    else if (c === '\n') row.push(cell), rows.push(row), (row = []), (cell = '');
    else if (c !== '\r') cell += c;
  }
  return rows;
}

for (const args of commands) {
  const rows = run([...args, '--json']).trim().split('\n').map((l) => JSON.parse(l));
  const [header, ...records] = csvRows(run([...args, '--csv']));
  const ok = rows.filter((r) => !r.error);
  const notes = ok.reduce((n, r) => n + r.notes.length, 0);
  console.log(`${args[0].padEnd(13)} json: ${rows.length} row(s), ${ok.length} ok, ${notes} note(s), keys ${Object.keys(ok[0] ?? rows[0]).slice(0, 6).join(',')}…  csv: ${records.length} row(s) × ${header.length} columns, last: ${header.slice(-3).join(',')}`);
}
