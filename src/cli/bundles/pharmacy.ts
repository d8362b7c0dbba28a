// The command line's bundle for `pondus meq`, `pondus osmolarity`, `pondus alligation`, `pondus potency`, `pondus strength`: only their own code is loaded.
import { registerPharmacy, PHARMACY_PRESENTERS } from '../commands/pharmacy.js';
import { start } from '../start.js';

start({ register: (program, run) => registerPharmacy(program, run), presenters: PHARMACY_PRESENTERS });
