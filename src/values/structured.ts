// The value protocol lives in src/protocol/ (below algebra, which implements it); this keeps the
// values layer's own name for it.

export { isStructured, type Structured } from '../protocol/structured.js';
