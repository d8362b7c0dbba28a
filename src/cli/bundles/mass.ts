// The command line's bundle for `pondus mass`: only its own code is loaded.
import { registerMass, massPresenter } from '../commands/mass.js';
import { start } from '../start.js';

start({ register: (program, run) => registerMass(program, run), presenters: { mass: massPresenter } });
