// The command line's bundle for `pondus composition`: only its own code is loaded.
import { registerComposition, compositionPresenter } from '../commands/composition.js';
import { start } from '../start.js';

start({ register: (program, run) => registerComposition(program, run), presenters: { composition: compositionPresenter } });
