// Text that came from input (ids, statements, expressions, file names) may hold control bytes:
// an escape sequence printed raw can rewrite the terminal, a carriage return can hide a line.
// Everything shown or written from input goes through escapeControl first.

// C0 controls except tab and newline, DEL, C1 controls, and the Unicode bidirectional overrides
// and isolates (which reorder what is shown).
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g;

/** `text` with every control character shown as \xNN (or \u{NNNN}); tab and newline kept unless `oneLine`. */
export function escapeControl(text: string, oneLine = false): string {
  const re = oneLine ? /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/g : CONTROL;
  return text.replace(re, (c) => {
    const code = c.charCodeAt(0);
    return code < 0x100 ? `\\x${code.toString(16).padStart(2, '0')}` : `\\u{${code.toString(16)}}`;
  });
}

/** True when the text holds a character escapeControl would change. */
export function hasControl(text: string, oneLine = false): boolean {
  return (
    oneLine
      ? /[\u0000-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/
      : /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u202a-\u202e\u2066-\u2069]/
  ).test(text);
}
