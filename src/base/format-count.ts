// How every count is written for people: digits grouped by threes with commas ("46,233"), the
// same in reports, status tables, merge summaries and error messages, whatever the locale.

export function formatCount(n: number | bigint): string {
  const s = (typeof n === 'bigint' ? (n < 0n ? -n : n) : Math.abs(n)).toString();
  const negative = typeof n === 'bigint' ? n < 0n : n < 0;
  return (negative ? '-' : '') + s.replace(/\B(?=(\d{3})+(?!\d))/g, ',');
}
