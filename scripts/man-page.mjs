// Writes the manual page, dist/pondus.1, from the built CLI's own help text (`pondus manual`), so
// that the page shipped is the help of the commands shipped. Run by `npm run build`.
import { execFileSync } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const page = execFileSync(process.execPath, [`${root}bin/pondus.cjs`, 'manual'], { encoding: 'utf8' });
writeFileSync(`${root}dist/pondus.1`, page);
