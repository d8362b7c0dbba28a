// The command line's bundle for `pondus ion`, `pondus pattern`: only their own code is loaded.
import { registerIonCommands, ionPresenter } from '../commands/ion.js';
import { patternPresenter } from '../commands/pattern.js';
import { start } from '../start.js';

start({ register: registerIonCommands, presenters: { ion: ionPresenter, pattern: patternPresenter } });
