// Writing a whole file so that readers see the old content or the new, never half of it: the text
// goes to a temporary file in the same folder (created exclusively, so it never opens an existing
// file or a planted link), is flushed to disk, and is renamed over the target. The target is never
// followed through a symbolic link: a link there is refused, and with `within` the folder must
// really (links resolved) lie inside that folder. Temporary files are named
// `.<name>.hunch-<pid>-<random>.tmp`; one left by a killed process is removed by the next write to
// the same file, once its process is gone.

import {
  closeSync,
  fsyncSync,
  lstatSync,
  statSync,
  mkdirSync,
  openSync,
  readdirSync,
  realpathSync,
  renameSync,
  unlinkSync,
  writeSync,
} from 'node:fs';
import { randomBytes } from 'node:crypto';
import { basename, dirname, join, relative, isAbsolute, sep } from 'node:path';
import { InputError } from '../base/errors.js';

export interface AtomicWriteOptions {
  /** The folder the file must lie in (a project root): refused when it would land elsewhere. */
  within?: string;
  /** What the file is, for messages ("the counterexample file"). */
  what?: string;
  /** Create missing folders (default true); false: a missing folder is an error. */
  makeFolder?: boolean;
}

function tempPrefix(name: string): string {
  return `.${name}.hunch-`;
}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return (e as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** Remove temporary files of `name` in `dir` whose writing process is gone. */
function sweepStaleTemps(dir: string, name: string): void {
  let entries: string[];
  try {
    entries = readdirSync(dir);
  } catch {
    return;
  }
  const prefix = tempPrefix(name);
  for (const e of entries) {
    if (!e.startsWith(prefix) || !e.endsWith('.tmp')) continue;
    const pid = Number(/^(\d+)-/.exec(e.slice(prefix.length))?.[1]);
    if (Number.isSafeInteger(pid) && pid !== process.pid && !processAlive(pid)) {
      try {
        unlinkSync(join(dir, e));
      } catch {
        // another process swept it first
      }
    }
  }
}

/** True when `inner` is `outer` or lies under it. */
export function isInside(outer: string, inner: string): boolean {
  const rel = relative(outer, inner);
  return rel === '' || (!rel.startsWith('..' + sep) && rel !== '..' && !isAbsolute(rel));
}

function realOrSelf(p: string): string {
  try {
    return realpathSync(p);
  } catch {
    return p;
  }
}

/** Refuse a path that is a link, or that would land outside `within` once links are resolved. */
export function checkWritablePath(path: string, opts: AtomicWriteOptions = {}): void {
  const what = opts.what ?? 'the file';
  let st;
  try {
    st = lstatSync(path);
  } catch {
    st = null;
  }
  if (st?.isSymbolicLink())
    throw new InputError(`refusing to write ${what} ${path}: it is a symbolic link, and hunch never writes through a link`);
  if (st && !st.isFile()) throw new InputError(`cannot write ${what} ${path}: it is not a regular file`);
  if (opts.within) {
    const root = realOrSelf(opts.within);
    // The nearest existing folder above the file, links resolved, must lie inside the root.
    let dir = dirname(path);
    while (true) {
      try {
        lstatSync(dir);
        break;
      } catch {
        const up = dirname(dir);
        if (up === dir) break;
        dir = up;
      }
    }
    if (!isInside(root, join(realOrSelf(dir), relative(dir, dirname(path)))))
      throw new InputError(
        `refusing to write ${what} ${path}: it would land outside the project ${opts.within} (through a link or a path that leaves it)`,
      );
  }
}

export function writeFileAtomic(path: string, content: string, opts: AtomicWriteOptions = {}): void {
  const what = opts.what ?? 'the file';
  const dir = dirname(path);
  const name = basename(path);
  checkWritablePath(path, opts);
  try {
    if (opts.makeFolder === false) {
      if (!statSync(dir).isDirectory()) throw new Error(`${dir} is not a folder`);
    } else mkdirSync(dir, { recursive: true });
  } catch (e) {
    if ((e as NodeJS.ErrnoException).code === 'ENOENT')
      throw new InputError(`cannot write ${what} ${path}: the folder ${dir} does not exist`);
    throw new InputError(`cannot write ${what} ${path}: ${(e as Error).message}`);
  }
  if (opts.within) checkWritablePath(path, opts); // the folders made just now: still inside
  sweepStaleTemps(dir, name);
  const temp = join(dir, `${tempPrefix(name)}${process.pid}-${randomBytes(4).toString('hex')}.tmp`);
  let fd: number | null = null;
  try {
    fd = openSync(temp, 'wx', 0o644);
    const buf = Buffer.from(content, 'utf8');
    let off = 0;
    while (off < buf.length) off += writeSync(fd, buf, off, buf.length - off);
    fsyncSync(fd);
    closeSync(fd);
    fd = null;
    renameSync(temp, path);
  } catch (e) {
    if (fd !== null) {
      try {
        closeSync(fd);
      } catch {
        // already closed
      }
    }
    try {
      unlinkSync(temp);
    } catch {
      // never created
    }
    throw new InputError(`cannot write ${what} ${path}: ${(e as Error).message}`);
  }
}
