// Saunders & Fofonoff (1976) formula as given in Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44.

function gravity(p: number, lat: number): number {
  const x = Math.sin((lat * Math.PI) / 180) ** 2;
  return 9.780318 * (1 + (5.2788e-3 + 2.36e-5 * x) * x) + 1.092e-6 * p;
}

function numerator(p: number): number {
  return (((-1.82e-15 * p + 2.279e-10) * p - 2.2512e-5) * p + 9.72659) * p;
}

function numeratorSlope(p: number): number {
  return ((-4 * 1.82e-15 * p + 3 * 2.279e-10) * p - 2 * 2.2512e-5) * p + 9.72659;
}

/** Depth in metres (positive down) from sea pressure in dbar and latitude in degrees (Saunders & Fofonoff 1976; Fofonoff & Millard 1983, UNESCO Tech. Pap. Mar. Sci. 44). */
export function depthFromPressure(p: number, lat: number): number {
  return numerator(p) / gravity(p, lat);
}

/** Sea pressure in dbar from depth in metres and latitude, by Newton's method on depthFromPressure (inverse of Fofonoff & Millard 1983). */
export function pressureFromDepth(z: number, lat: number): number {
  if (!Number.isFinite(z) || !Number.isFinite(lat)) return NaN;
  // 1 dbar ≈ 1 m is close enough that a handful of Newton steps converge to round-off.
  let p = z;
  for (let i = 0; i < 20; i++) {
    const g = gravity(p, lat);
    const f = numerator(p) / g - z;
    const slope = (numeratorSlope(p) * g - numerator(p) * 1.092e-6) / (g * g);
    const step = f / slope;
    p -= step;
    if (Math.abs(step) < 1e-10 * Math.max(1, Math.abs(p))) break;
  }
  return p;
}
