/** n points spaced evenly in log10 from min to max inclusive (both > 0); one point if min = max. */
export function logGrid(min: number, max: number, n: number): number[] {
  if (n <= 1 || min === max) return [min];
  const a = Math.log10(min);
  const step = (Math.log10(max) - a) / (n - 1);
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(i === n - 1 ? max : i === 0 ? min : 10 ** (a + i * step));
  return out;
}
