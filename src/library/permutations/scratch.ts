// A reusable typed-array buffer, so a statistic evaluated once per case allocates nothing. Each
// function that needs one holds its own Scratch; library functions are never re-entered while
// they hold it, so reuse is safe.

export class Scratch {
  private buf = new Int32Array(32);

  /** A zero-filled Int32Array with at least `size` entries, valid until the next call. */
  get(size: number): Int32Array {
    if (this.buf.length < size) this.buf = new Int32Array(Math.max(size, 2 * this.buf.length));
    else this.buf.fill(0, 0, size);
    return this.buf;
  }
}
