// Where output goes and how it looks: colour only on a terminal and never with NO_COLOR; Unicode
// pictures unless --ascii or the terminal cannot show them.

import { Chalk, type ChalkInstance } from 'chalk';

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

export function makeTerminal(opts: { ascii?: boolean } = {}): Terminal {
  const color = new Chalk({ level: wantsColor(process.stdout) ? 1 : 0 });
  return {
    out: (s) => process.stdout.write(s),
    err: (s) => process.stderr.write(s),
    color,
    isTTY: Boolean(process.stdout.isTTY),
    errIsTTY: Boolean(process.stderr.isTTY),
    unicode: !opts.ascii && canShowUnicode(),
  };
}
