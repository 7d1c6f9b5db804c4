// The two kinds of failure hunch reports to users. Neither ever reaches the user as a stack trace:
// the CLI catches both and prints their message with the source position.

/** A place in a user's file: 1-based line and column. */
export interface SourcePos {
  file: string;
  line: number;
  column: number;
}

/**
 * Bad input: a file, expression or option that is invalid. Found before anything runs
 * (exit code 2, nothing recorded).
 */
export class InputError extends Error {
  constructor(
    message: string,
    public readonly pos?: SourcePos,
    /** The offending text, shown under the message. */
    public readonly snippet?: string,
    /** The nearest valid name, when one exists. */
    public readonly suggestion?: string,
  ) {
    super(message);
    this.name = 'InputError';
  }
}

/**
 * A failure while evaluating one case (division by zero, a type error at run time, a bad argument).
 * The runner attaches the bindings of the case; such a case is never counted as a pass.
 */
export class EvalError extends Error {
  constructor(
    message: string,
    public pos?: SourcePos,
  ) {
    super(message);
    this.name = 'EvalError';
  }
}

/** Thrown by library code for a bad argument value; becomes an EvalError with a position. */
export function fail(message: string): never {
  throw new EvalError(message);
}

/**
 * Several input errors found together (every YAML hazard of a file), reported in one run. The
 * fields of InputError are the first one's; `message` lists them all, each after the first with
 * its position; `errors` holds them apart for a caller that prints each on its own.
 */
export class InputErrors extends InputError {
  constructor(public readonly errors: InputError[]) {
    super(
      errors.map((e, i) => (i === 0 || !e.pos ? e.message : `${e.pos.file}:${e.pos.line}:${e.pos.column}: ${e.message}`)).join('\n'),
      errors[0]?.pos,
      errors[0]?.snippet,
      errors[0]?.suggestion,
    );
    this.name = 'InputError';
  }
}

/**
 * Thrown from inside a long evaluation (a comprehension, an enumeration) when the run must stop:
 * its budget is spent or the user interrupted it. Not an error of the case: the case is simply not
 * finished, so it is neither a pass nor a failure.
 */
export class StopSignal extends Error {
  constructor(public readonly reason: 'budget' | 'interrupt') {
    super(reason === 'budget' ? 'the budget was reached inside a case' : 'interrupted inside a case');
    this.name = 'StopSignal';
  }
}
