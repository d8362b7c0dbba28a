// The command line's bundle for `pondus react`: only its own code is loaded.
import { registerReact, reactPresenter } from '../commands/react.js';
import { start } from '../start.js';

start({ register: (program, run) => registerReact(program, run), presenters: { react: reactPresenter } });
