// A progress line on standard error with an estimate of the time left, shown only on a terminal
// and only once a check has run for about two seconds (CLI.md).

import { formatCount } from '../base/format-count.js';

export class ProgressLine {
  private shown = false;
  private readonly started = performance.now();
  private pieceStart = performance.now();
  private lastLabel = '';

  constructor(
    private readonly write: (s: string) => void,
    private readonly enabled: boolean,
    private readonly width = 28,
  ) {}

  update(done: number, total: number | null, label: string): void {
    if (!this.enabled) return;
    const now = performance.now();
    if (label !== this.lastLabel) {
      this.lastLabel = label;
      this.pieceStart = now;
    }
    if (!this.shown && now - this.started < 2000) return;
    this.shown = true;
    let bar = '';
    let eta = '';
    if (total && total > 0) {
      const frac = Math.min(1, done / total);
      const filled = Math.round(frac * this.width);
      bar = `[${'#'.repeat(filled)}${'.'.repeat(this.width - filled)}] ${Math.floor(frac * 100)}% `;
      const elapsed = now - this.pieceStart;
      if (frac > 0.01) eta = ` · about ${formatSeconds(((1 - frac) * elapsed) / frac)} left`;
    }
    const counts = total ? `${formatCount(done)}/${formatCount(total)}` : formatCount(done);
    const line = `${bar}${label} · ${counts} cases${eta}`;
    this.write(`\r\x1b[2K${line.slice(0, (process.stderr.columns || 100) - 1)}`);
  }

  clear(): void {
    if (this.shown) this.write('\r\x1b[2K');
  }
}

function formatSeconds(ms: number): string {
  const s = Math.ceil(ms / 1000);
  if (s < 60) return `${s} s`;
  const m = Math.floor(s / 60);
  if (m < 60) return `${m} min ${s % 60} s`;
  return `${Math.floor(m / 60)} h ${m % 60} min`;
}
