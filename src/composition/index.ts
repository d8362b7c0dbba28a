export { composition, safeComposition, type CompositionResult, type CompositionOptions, type ElementShare } from './element-shares.js';
export { partShare, type PartShare } from './part-share.js';
export { compositionJson, type CompositionJson } from './composition-json.js';
