// EOS-80 coefficients as printed in Fofonoff & Millard (1983), UNESCO Tech. Pap. Mar. Sci. 44; checked against its check values in the tests.

/** Density of pure water (SMOW) at one atmosphere, kg m⁻³, T in °C (IPTS-68); Fofonoff & Millard 1983. */
function pureWaterDensity(t: number): number {
  return 999.842594 + t * (6.793952e-2 + t * (-9.09529e-3 + t * (1.001685e-4 + t * (-1.120083e-6 + t * 6.536332e-9))));
}

/** One-atmosphere density of seawater, kg m⁻³ (Millero & Poisson 1981; Fofonoff & Millard 1983). */
export function seawaterDensitySurface(s: number, t: number): number {
  const b = 8.24493e-1 + t * (-4.0899e-3 + t * (7.6438e-5 + t * (-8.2467e-7 + t * 5.3875e-9)));
  const c = -5.72466e-3 + t * (1.0227e-4 + t * -1.6546e-6);
  const d = 4.8314e-4;
  return pureWaterDensity(t) + b * s + c * s * Math.sqrt(s) + d * s * s;
}

/** Secant bulk modulus K(S, T, p) of seawater, bar, p in bar (Millero et al. 1980; Fofonoff & Millard 1983). */
export function secantBulkModulus(s: number, t: number, pBar: number): number {
  const kw = 19652.21 + t * (148.4206 + t * (-2.327105 + t * (1.360477e-2 + t * -5.155288e-5)));
  const aw = 3.239908 + t * (1.43713e-3 + t * (1.16092e-4 + t * -5.77905e-7));
  const bw = 8.50935e-5 + t * (-6.12293e-6 + t * 5.2787e-8);
  const s15 = s * Math.sqrt(s);
  const k0 = kw + (54.6746 + t * (-0.603459 + t * (1.09987e-2 + t * -6.167e-5))) * s + (7.944e-2 + t * (1.6483e-2 + t * -5.3009e-4)) * s15;
  const a = aw + (2.2838e-3 + t * (-1.0981e-5 + t * -1.6078e-6)) * s + 1.91075e-4 * s15;
  const b = bw + (-9.9348e-7 + t * (2.0816e-8 + t * 9.1697e-10)) * s;
  return k0 + pBar * (a + pBar * b);
}

/**
 * In-situ seawater density ρ(S, T, p) by EOS-80, kg m⁻³; S practical salinity, T in °C (IPTS-68), p sea pressure in dbar.
 * ρ = ρ(S,T,0) / (1 − p/K(S,T,p)), Fofonoff & Millard (1983) UNESCO Tech. Pap. Mar. Sci. 44.
 */
export function seawaterDensity(s: number, t: number, p: number): number {
  const pBar = p / 10;
  return seawaterDensitySurface(s, t) / (1 - pBar / secantBulkModulus(s, t, pBar));
}

/** IPTS-68 temperature from ITS-90, °C: T68 = 1.00024·T90 (Saunders 1990, WOCE Newsletter 10). */
export function t68FromT90(t90: number): number {
  return 1.00024 * t90;
}
