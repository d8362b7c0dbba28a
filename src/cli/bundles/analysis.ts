// The command line's bundle for `pondus analysis`: only its own code is loaded.
import { registerAnalysis, analysisPresenter } from '../commands/analysis.js';
import { start } from '../start.js';

start({ register: registerAnalysis, presenters: { analysis: analysisPresenter } });
