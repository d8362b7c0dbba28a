export type { Issue, IssueCode, Note } from './issue.js';
export { PondusError, fail, toSafe, type SafeResult } from './pondus-error.js';
export { renderError, errorJson, type RenderOptions } from './render.js';
