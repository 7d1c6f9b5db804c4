// Escaping text for XML and HTML (element content and attribute values alike).

import { escapeControl } from '../../base/escape.js';

/** Escape text for XML content and attributes; control characters are shown as \xNN, others XML 1.0 cannot hold are dropped. */
export function xmlEscape(s: string): string {
  return escapeControl(s)
    .replace(/[^\x09\x0a\x0d\x20-\ud7ff\ue000-\ufffd\u{10000}-\u{10ffff}]/gu, '')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}
