// Fixed coordinate precision in SVG geometry attributes, so output bytes do not depend on float noise.

const GEOMETRY_ATTRS = new Set([
  'd', 'transform', 'x', 'y', 'x1', 'x2', 'y1', 'y2', 'width', 'height', 'cx', 'cy', 'r', 'rx', 'ry',
  'points', 'stroke-width', 'font-size', 'opacity', 'fill-opacity', 'stroke-opacity', 'viewBox', 'dx', 'dy',
  'offset', 'stroke-dasharray',
]);

/** A number rounded to `digits` decimals, written without trailing zeros or negative zero. */
export function formatNumber(value: number, digits = 2): string {
  const s = value.toFixed(digits);
  const trimmed = s.includes('.') ? s.replace(/0+$/, '').replace(/\.$/, '') : s;
  return trimmed === '-0' ? '0' : trimmed;
}

/** Rounds every number inside geometry attributes (d, transform, x, …) to `digits` decimals; text content is left alone. */
export function roundSvgNumbers(svg: string, digits = 2): string {
  return svg.replace(/ ([a-zA-Z-]+)="([^"]*)"/g, (whole, name: string, value: string) => {
    if (!GEOMETRY_ATTRS.has(name)) return whole;
    const rounded = value.replace(/-?(?:\d+\.\d*|\.\d+|\d+)(?:e[-+]?\d+)?/gi, (num) => formatNumber(Number(num), digits));
    return ` ${name}="${rounded}"`;
  });
}
