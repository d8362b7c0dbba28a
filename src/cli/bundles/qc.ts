// The command line's bundle for `pondus titration`, `pondus standardise`, `pondus sample-basis`, `pondus replicates`: only their own code is loaded.
import { registerQc, QC_PRESENTERS } from '../commands/qc.js';
import { start } from '../start.js';

start({ register: (program, run, _stdin, only) => registerQc(program, run, only), presenters: QC_PRESENTERS });
