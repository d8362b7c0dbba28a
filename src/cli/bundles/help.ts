// The command line's bundle for `pondus --help`, `help`, `completion`, `manual` and anything that
// names no command: every command declared (names, descriptions, options), none of their code.
import { declareAnalysis, declareBalance, declareCalc, declareComposition, declareConversions, declareEmpirical, declareIon, declareMass, declarePharmacy, declarePrepare, declareQc, declareReact, declareReagents } from '../commands/declarations.js';
import { finishProgram } from '../program-setup.js';
import { start } from '../start.js';

start({
  // in the order of ALL_COMMANDS (main.ts), which a test holds this to
  register(program) {
    declareMass(program);
    declareComposition(program);
    declareCalc(program);
    declareAnalysis(program);
    declareEmpirical(program);
    declareBalance(program);
    declareReact(program);
    declareReagents(program);
    declarePrepare(program);
    declareConversions(program);
    declareQc(program);
    declarePharmacy(program);
    declareIon(program);
  },
  presenters: {},
  finish: finishProgram,
});
