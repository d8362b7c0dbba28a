import { pondus } from '../cli/run-cli.js';

/** The words of a command line written with single quotes, as a POSIX shell splits them; stops at a redirection. */
export function shellWords(line: string): string[] {
  const words: string[] = [];
  let word: string | null = null;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (c === "'") {
      const end = line.indexOf("'", i + 1);
      word = (word ?? '') + line.slice(i + 1, end);
      i = end;
    } else if (c === ' ') {
      if (word !== null) words.push(word);
      word = null;
    } else if ((c === '>' || c === '|' || c === '&') && word === null) {
      break;
    } else word = (word ?? '') + c;
  }
  if (word !== null) words.push(word);
  return words;
}

/** The command names `pondus --help` lists, without those given. */
export function listedCommands(without: ReadonlySet<string>): string[] {
  const help = pondus(['--help']).stdout;
  const block = help.slice(help.indexOf('Commands:'));
  return [...block.matchAll(/^ {2}([a-z][a-z-]*)/gm)].map((m) => m[1]).filter((n) => !without.has(n));
}
