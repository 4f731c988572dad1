// Continuous colour scales for map layers: a 256-entry lookup table from a vega scheme, linear or log10.
import * as vega from 'vega';
import { ticks as niceTicks } from 'd3-array';

/** Options of a continuous colour scale. */
export interface ColourScaleOptions {
  /** Data domain [low, high] in the layer's units; for log scales both must be > 0. */
  domain: [number, number];
  /** Log10 position (for dFe, Fe:C spanning decades). */
  log?: boolean;
  /** vega scheme name (viridis, cividis, blueorange …). */
  scheme: string;
  /** Diverging: the domain is made symmetric about zero so zero sits at the middle colour. */
  centreZero?: boolean;
}

/** A colour scale usable per pixel without allocation. */
export interface ColourScale {
  /** Effective domain after log/centring adjustments. */
  domain: [number, number];
  /** True for a log10 scale. */
  log: boolean;
  /** 256 × RGB lookup table. */
  lut: Uint8Array;
  /** Position of a value in [0, 1] (clamped), NaN for missing or non-positive values on a log scale. */
  position(value: number): number;
  /** Lookup-table index 0..255 of a value, −1 for missing. */
  index(value: number): number;
  /** '#rrggbb' of a value, or undefined for missing. */
  hex(value: number): string | undefined;
  /** Tick values for a colour bar. */
  ticks(count?: number): number[];
}

function parseColour(css: string): [number, number, number] {
  const m = /rgb\((\d+),\s*(\d+),\s*(\d+)\)/.exec(css);
  if (m) return [Number(m[1]), Number(m[2]), Number(m[3])];
  const h = /^#([0-9a-f]{6})$/i.exec(css);
  if (h) return [0, 2, 4].map((k) => parseInt(h[1].slice(k, k + 2), 16)) as [number, number, number];
  throw new Error(`colour-scale: cannot parse colour ${css}`);
}

/** The 256-entry RGB table of a vega continuous scheme. */
export function schemeLut(scheme: string): Uint8Array {
  const interp = (vega as unknown as { scheme(name: string): ((t: number) => string) | string[] | undefined }).scheme(scheme);
  if (typeof interp !== 'function') throw new Error(`colour-scale: ${scheme} is not a continuous vega scheme`);
  const lut = new Uint8Array(256 * 3);
  for (let i = 0; i < 256; i++) lut.set(parseColour(interp(i / 255)), i * 3);
  return lut;
}

function hexOf(lut: Uint8Array, i: number): string {
  return '#' + [lut[i * 3], lut[i * 3 + 1], lut[i * 3 + 2]].map((c) => c.toString(16).padStart(2, '0')).join('');
}

function logTicks(lo: number, hi: number): number[] {
  const out: number[] = [];
  const e0 = Math.floor(Math.log10(lo));
  const e1 = Math.ceil(Math.log10(hi));
  const mult = e1 - e0 <= 2 ? [1, 2, 5] : [1];
  for (let e = e0; e <= e1; e++) {
    for (const m of mult) {
      const v = Number((m * 10 ** e).toPrecision(12));
      if (v >= lo * (1 - 1e-9) && v <= hi * (1 + 1e-9)) out.push(v);
    }
  }
  return out;
}

/** A linear or log10 colour scale over `domain` with the scheme's colours (sequential or zero-centred diverging). */
export function colourScale(options: ColourScaleOptions): ColourScale {
  const log = options.log ?? false;
  let [lo, hi] = options.domain;
  if (options.centreZero) {
    const m = Math.max(Math.abs(lo), Math.abs(hi)) || 1;
    lo = -m;
    hi = m;
  }
  if (log && !(lo > 0 && hi > 0)) throw new Error(`colour-scale: a log scale needs a positive domain, got [${lo}, ${hi}]`);
  if (!(hi > lo)) hi = lo + (log ? lo : 1);
  const a = log ? Math.log10(lo) : lo;
  const b = log ? Math.log10(hi) : hi;
  const lut = schemeLut(options.scheme);
  const position = (value: number): number => {
    if (Number.isNaN(value) || (log && value <= 0)) return Number.NaN;
    const t = ((log ? Math.log10(value) : value) - a) / (b - a);
    return t < 0 ? 0 : t > 1 ? 1 : t;
  };
  const index = (value: number): number => {
    const t = position(value);
    return Number.isNaN(t) ? -1 : Math.round(t * 255);
  };
  return {
    domain: [lo, hi],
    log,
    lut,
    position,
    index,
    hex: (value) => {
      const i = index(value);
      return i < 0 ? undefined : hexOf(lut, i);
    },
    ticks: (count = 5) => (log ? logTicks(lo, hi) : niceTicks(lo, hi, count)),
  };
}

/** Finite [min, max] of values (positive values only when `positive`), or undefined when none. */
export function valueExtent(values: ArrayLike<number>, positive = false): [number, number] | undefined {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!Number.isFinite(v) || (positive && v <= 0)) continue;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return lo <= hi ? [lo, hi] : undefined;
}
