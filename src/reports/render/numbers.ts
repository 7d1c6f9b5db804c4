// Coordinates as short decimal text for picture files (geometry only, never a computed quantity).

export function coord(x: number): string {
  const r = Math.round(x * 1000) / 1000;
  return Object.is(r, -0) ? '0' : String(r);
}
