// What a fuzz run may end in: success, or an InputError / EvalError with a clear message. Anything
// else (another exception, a stack overflow, a message that leaks JavaScript internals) is a bug.

import { EvalError, InputError } from '../../src/base/errors.js';

/** Text that means a JavaScript detail reached the user instead of a sentence about their input. */
const LEAKS = /internal error|\[object |undefined|NaN|Maximum call stack|is not a function|Cannot read prop/;

/** Throws (failing the property) unless e is an acceptable, clearly worded error. */
export function expectCleanError(e: unknown, input: string): 'input' | 'eval' {
  const show = `\n--- input ---\n${input.length > 1500 ? input.slice(0, 1500) + '...' : input}\n---`;
  if (!(e instanceof InputError) && !(e instanceof EvalError)) {
    const what = e instanceof Error ? `${e.name}: ${e.message}\n${e.stack}` : String(e);
    throw new Error(`an unexpected exception (not InputError/EvalError): ${what}${show}`);
  }
  if (!e.message || e.message.length > 2000) throw new Error(`an empty or huge message (${e.message.length} characters)${show}`);
  if (LEAKS.test(e.message)) throw new Error(`a message that leaks internals: ${e.message}${show}`);
  if (e instanceof InputError && e.pos) {
    if (!(e.pos.line >= 1 && e.pos.column >= 1)) throw new Error(`a bad position ${JSON.stringify(e.pos)}: ${e.message}${show}`);
  }
  return e instanceof InputError ? 'input' : 'eval';
}

/** Run f, failing when it takes longer than ms (it cannot be interrupted, so this is after the fact). */
export function timed<T>(ms: number, input: string, f: () => T): T {
  const t0 = performance.now();
  const checkTime = () => {
    const dt = performance.now() - t0;
    if (dt > ms) throw new Error(`took ${dt.toFixed(0)} ms (limit ${ms} ms)\n--- input ---\n${input.slice(0, 1500)}\n---`);
  };
  let out: T;
  try {
    out = f();
  } catch (e) {
    checkTime(); // a run over the limit is reported as such, whatever it ended with
    throw e;
  }
  checkTime();
  return out;
}
