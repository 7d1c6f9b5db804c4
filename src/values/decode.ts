// The decoder registry lives in src/protocol/ (below algebra, whose kinds register decoders); this
// keeps the values layer's own name for it.

export { decodeValue, knownEncodings, registerDecoder } from '../protocol/decode.js';
