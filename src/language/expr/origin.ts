// Origins: how offsets in an expression's text map to positions in the user's file.

import { InputError, type SourcePos } from '../../base/errors.js';
import type { Origin, SourceText } from './ast.js';

/**
 * The origin of a text that sits verbatim in a file starting at (line, column), 1-based: offsets
 * after a newline in the text continue on the next lines at column 1 (right for plain one-line
 * YAML scalars and for `hunch eval`; a loader with folded or indented block scalars supplies its own).
 */
export function textOrigin(file: string, text: string, line = 1, column = 1): Origin {
  return {
    file,
    locate(offset: number) {
      let l = line,
        c = column;
      const stop = Math.min(offset, text.length);
      for (let i = 0; i < stop; i++) {
        if (text.charCodeAt(i) === 10) {
          l++;
          c = 1;
        } else c++;
      }
      return { line: l, column: c + Math.max(0, offset - text.length) };
    },
  };
}

export function sourcePos(src: SourceText | undefined, offset: number): SourcePos | undefined {
  if (!src) return undefined;
  const { line, column } = src.origin.locate(offset);
  return { file: src.origin.file, line, column };
}

/** An InputError pointing at [start, end) of the source. */
export function inputError(message: string, src: SourceText | undefined, start: number, end: number, suggestion?: string): InputError {
  const snippet = src ? src.text.slice(start, Math.max(end, start + 1)) || src.text.slice(start) : undefined;
  return new InputError(message, sourcePos(src, start), snippet, suggestion);
}
