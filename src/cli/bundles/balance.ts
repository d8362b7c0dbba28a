// The command line's bundle for `pondus balance`: only its own code is loaded.
import { registerBalance, balancePresenter } from '../commands/balance.js';
import { start } from '../start.js';

start({ register: (program, run) => registerBalance(program, run), presenters: { balance: balancePresenter } });
