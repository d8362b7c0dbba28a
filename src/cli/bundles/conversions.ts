// The command line's bundle for `pondus dilute`, `pondus gravimetric`, `pondus basis`, `pondus salt`: only their own code is loaded.
import { registerConversions, basisPresenter, dilutePresenter, gravimetricPresenter, saltPresenter } from '../commands/conversions.js';
import { start } from '../start.js';

start({ register: (program, run, _stdin, only) => registerConversions(program, run, only), presenters: { dilute: dilutePresenter, gravimetric: gravimetricPresenter, basis: basisPresenter, salt: saltPresenter } });
