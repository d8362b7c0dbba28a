// The command line's bundle for `pondus prepare`: only its own code is loaded.
import { registerPrepare, preparePresenter } from '../commands/prepare.js';
import { start } from '../start.js';

start({ register: registerPrepare, presenters: { prepare: preparePresenter } });
