// The command line's bundle for `pondus meq`, `pondus osmolarity`, `pondus alligation`, `pondus potency`, `pondus strength`: only their own code is loaded.
import { registerPharmacy, PHARMACY_PRESENTERS } from '../commands/pharmacy.js';
import { start } from '../start.js';

start({ register: (program, run, _stdin, only) => registerPharmacy(program, run, only), presenters: PHARMACY_PRESENTERS });
