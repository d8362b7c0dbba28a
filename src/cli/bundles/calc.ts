// The command line's bundle for `pondus calc`: only its own code is loaded.
import { registerCalc, calcPresenter } from '../commands/calc.js';
import { start } from '../start.js';

start({ register: (program, run) => registerCalc(program, run), presenters: { calc: calcPresenter } });
