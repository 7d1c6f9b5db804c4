// Where output goes and how it looks: colour only on a terminal and never with NO_COLOR; Unicode
// pictures unless --ascii or the terminal cannot show them.

import { Chalk, type ChalkInstance } from 'chalk';
import { escapeControl } from '../base/escape.js';

export interface Terminal {
  out: (s: string) => void;
  err: (s: string) => void;
  color: ChalkInstance;
  isTTY: boolean;
  errIsTTY: boolean;
  unicode: boolean;
}

export function wantsColor(stream: NodeJS.WriteStream): boolean {
  if (process.env.NO_COLOR !== undefined && process.env.NO_COLOR !== '') return false;
  return Boolean(stream.isTTY);
}

export function canShowUnicode(): boolean {
  const lang = `${process.env.LC_ALL ?? ''}${process.env.LC_CTYPE ?? ''}${process.env.LANG ?? ''}`;
  if (process.env.TERM === 'linux') return false;
  return /utf-?8/i.test(lang) || process.platform === 'win32' || lang === '';
}

// A reader that went away (\`hunch check | head -1\`) closes the pipe: output stops quietly while the
// command finishes its work and its records.
const closed = { out: false, err: false };
let watching = false;
function watchClosedPipes(): void {
  if (watching) return;
  watching = true;
  for (const [name, stream] of [
    ['out', process.stdout],
    ['err', process.stderr],
  ] as const)
    stream.on('error', (e: NodeJS.ErrnoException) => {
      if (e.code === 'EPIPE' || e.code === 'ERR_STREAM_DESTROYED') closed[name] = true;
      else throw e;
    });
}

// No control byte from input reaches the terminal: everything written is escaped (\xNN) except
// newline and tab, and, on a terminal, the colour and line-clearing sequences hunch itself emits.
const OWN_SEQUENCE = /(\x1b\[[0-9;]*m|\r\x1b\[2K)/;

export function terminalSafe(s: string, tty: boolean): string {
  if (!tty) return escapeControl(s);
  return s
    .split(OWN_SEQUENCE)
    .map((part, i) => (i % 2 === 1 ? part : escapeControl(part)))
    .join('');
}

function write(name: 'out' | 'err', s: string): void {
  const stream = name === 'out' ? process.stdout : process.stderr;
  if (closed[name] || stream.destroyed) return;
  stream.write(terminalSafe(s, Boolean(stream.isTTY)));
}

export function makeTerminal(opts: { ascii?: boolean } = {}): Terminal {
  watchClosedPipes();
  const color = new Chalk({ level: wantsColor(process.stdout) ? 1 : 0 });
  return {
    out: (s) => write('out', s),
    err: (s) => write('err', s),
    color,
    isTTY: Boolean(process.stdout.isTTY),
    errIsTTY: Boolean(process.stderr.isTTY),
    unicode: !opts.ascii && canShowUnicode(),
  };
}
