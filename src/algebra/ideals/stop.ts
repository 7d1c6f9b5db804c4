// A stop check that every ideal computation polls (Gröbner bases, Hilbert series, facets), so
// that a run's budget or an interrupt can end a long computation with a clear error. The runner
// (or any caller) installs it with setIdealStop; by default nothing stops a computation except
// its size bounds.

let check: (() => boolean) | undefined;

/** Install (or, with undefined, remove) the stop check. */
export function setIdealStop(f: (() => boolean) | undefined): void {
  check = f;
}

/** The current stop check, as a shouldStop option. */
export function idealShouldStop(): boolean {
  return check !== undefined && check();
}
