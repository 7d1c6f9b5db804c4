// An InputError or EvalError in the form of the result document (CLI.md); anything else is a bug in
// hunch and is thrown on, for the CLI to report as one.

import { EvalError, InputError } from '../base/errors.js';
import type { ErrorInfo } from './result.js';

export function errorInfo(e: unknown, bindings: Record<string, unknown> | null): ErrorInfo {
  if (e instanceof EvalError || e instanceof InputError) {
    return {
      message: e.message,
      file: e.pos?.file ?? null,
      line: e.pos?.line ?? null,
      column: e.pos?.column ?? null,
      bindings,
      ...(e instanceof InputError && e.snippet ? { snippet: e.snippet } : {}),
      ...(e instanceof InputError && e.suggestion ? { suggestion: e.suggestion } : {}),
    };
  }
  throw e;
}
