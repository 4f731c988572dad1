/** Cell biovolume from a geometric shape and its linear dimensions; Hillebrand et al. 1999, J. Phycol. 35:403. */

/** Geometric shapes basinquota computes volumes for. */
export type CellShape = 'sphere' | 'prolate-spheroid' | 'cylinder' | 'capsule' | 'ellipsoid' | 'cone';

/** Linear cell dimensions in µm; which ones a shape uses is listed on `biovolumeFromShape`. */
export interface CellDimensions {
  /** Longest axis (µm): the diameter of a sphere, the height h of the other shapes. */
  length: number;
  /** Diameter d perpendicular to the length (µm); for an ellipsoid the second axis. */
  width?: number;
  /** Third axis (µm), ellipsoid only. */
  height?: number;
}

const SHAPE_ALIASES: Record<string, CellShape> = {
  sphere: 'sphere',
  'prolate-spheroid': 'prolate-spheroid',
  spheroid: 'prolate-spheroid',
  cylinder: 'cylinder',
  capsule: 'capsule',
  'cylinder-with-two-half-spheres': 'capsule',
  'cylinder-2-half-spheres': 'capsule',
  'cylinder+2-half-spheres': 'capsule',
  ellipsoid: 'ellipsoid',
  cone: 'cone',
};

/** Shape name from free text (case-insensitive, spaces and underscores read as hyphens); null when unknown. */
export function parseCellShape(text: string): CellShape | null {
  const key = text.trim().toLowerCase().replace(/[\s_]+/g, '-');
  return SHAPE_ALIASES[key] ?? null;
}

/**
 * Biovolume in µm³ (Hillebrand et al. 1999, J. Phycol. 35:403, Table 1):
 * sphere π/6·d³ (d = length); prolate spheroid π/6·d²·h (d = width, h = length);
 * cylinder π/4·d²·h; capsule (cylinder with two half spheres, h the total length) π·d²·(h/4 − d/12);
 * ellipsoid π/6·a·b·c (length, width, height); cone π/12·d²·h (d = base width, h = length).
 * NaN when a needed dimension is missing or not positive, or a capsule is shorter than it is wide.
 */
export function biovolumeFromShape(shape: CellShape, dims: CellDimensions): number {
  const h = dims.length;
  const d = dims.width ?? Number.NaN;
  const c = dims.height ?? Number.NaN;
  const ok = (...xs: number[]) => xs.every((x) => Number.isFinite(x) && x > 0);
  switch (shape) {
    case 'sphere':
      return ok(h) ? (Math.PI / 6) * h ** 3 : Number.NaN;
    case 'prolate-spheroid':
      return ok(h, d) ? (Math.PI / 6) * d * d * h : Number.NaN;
    case 'cylinder':
      return ok(h, d) ? (Math.PI / 4) * d * d * h : Number.NaN;
    case 'capsule':
      // The caps need a length of at least one diameter; shorter is not this shape.
      return ok(h, d) && h >= d ? Math.PI * d * d * (h / 4 - d / 12) : Number.NaN;
    case 'ellipsoid':
      return ok(h, d, c) ? (Math.PI / 6) * h * d * c : Number.NaN;
    case 'cone':
      return ok(h, d) ? (Math.PI / 12) * d * d * h : Number.NaN;
  }
}
