// The command line's bundle for `pondus reagents`: only its own code is loaded.
import { registerReagents, reagentsPresenter } from '../commands/reagents.js';
import { start } from '../start.js';

start({ register: registerReagents, presenters: { reagents: reagentsPresenter } });
