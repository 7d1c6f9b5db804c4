// How a user sees a problem: one clear message with file:line:column, the offending text and the
// nearest valid name — never a stack trace.

import { EvalError, InputError, InputErrors } from '../base/errors.js';
import { escapeControl } from '../base/escape.js';
import type { ErrorInfo } from '../runner/result.js';
import type { Terminal } from './terminal.js';

/** Exit codes of CLI.md. */
export const EXIT = { ok: 0, contradicted: 1, invalid: 2, interrupted: 3 } as const;

export function formatLocated(
  t: Terminal,
  message: string,
  pos: { file: string | null; line: number | null; column: number | null } | undefined,
  snippet?: string,
  suggestion?: string,
): string {
  // Text from input (file names, offending text) is shown with its control bytes escaped.
  message = escapeControl(message, true);
  snippet = snippet === undefined ? undefined : escapeControl(snippet, true);
  suggestion = suggestion === undefined ? undefined : escapeControl(suggestion, true);
  const where = pos?.file ? `${escapeControl(pos.file, true)}${pos.line ? `:${pos.line}` : ''}${pos.column ? `:${pos.column}` : ''}: ` : '';
  let s = `${t.color.bold(where)}${t.color.red('error:')} ${message}\n`;
  if (snippet && !message.includes(snippet)) s += `    ${snippet.length > 120 ? snippet.slice(0, 117) + '...' : snippet}\n`;
  if (suggestion && !message.includes(suggestion)) s += `    ${t.color.dim('hint:')} ${suggestion}\n`;
  return s;
}

export function formatError(t: Terminal, e: unknown): string {
  if (e instanceof InputErrors) return e.errors.map((x) => formatError(t, x)).join('');
  if (e instanceof InputError) return formatLocated(t, e.message, e.pos ? e.pos : undefined, e.snippet, e.suggestion);
  if (e instanceof EvalError) return formatLocated(t, e.message, e.pos);
  const msg = e instanceof Error ? e.message : String(e);
  const debug = process.env.HUNCH_DEBUG && e instanceof Error ? `\n${e.stack}` : '';
  return `${t.color.red('internal error:')} ${msg}\nThis is a bug in hunch, not in your file; please report it with the command you ran (HUNCH_DEBUG=1 shows details).${debug}\n`;
}

export function formatErrorInfo(t: Terminal, e: ErrorInfo): string {
  return formatLocated(t, e.message, e, e.snippet, e.suggestion);
}

/** Thrown by commands to end with an exit code after printing what they had to say. */
export class ExitRequest extends Error {
  constructor(readonly code: number) {
    super(`exit ${code}`);
  }
}
