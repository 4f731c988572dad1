/** Smooth basin-scale "true" ocean fields from which both the bottles and the gridded climatologies are drawn. */

/** Quantities the truth fields describe. */
export type FieldQuantity = 'dissolved_fe' | 'nitrate' | 'phosphate' | 'silicate' | 'temperature' | 'salinity';

/** Gaussian bump centred at (lat0, lon0) with widths in degrees; longitude difference wrapped across the dateline. */
function bump(lat: number, lon: number, lat0: number, lon0: number, sLat: number, sLon: number): number {
  const dLon = ((((lon - lon0 + 180) % 360) + 360) % 360) - 180;
  return Math.exp(-0.5 * ((lat - lat0) / sLat) ** 2 - 0.5 * (dLon / sLon) ** 2);
}

/** 1 south of about 50° S, 0 north of 45° S: the Southern Ocean weight. */
function southern(lat: number): number {
  return 1 / (1 + Math.exp((lat + 48) / 2.5));
}

/** 1 north of about 50° N: the subpolar weight. */
function subpolarNorth(lat: number): number {
  return 1 / (1 + Math.exp(-(lat - 46) / 3));
}

/** Seasonal anomaly in [-1, 1]: +1 at the end of local winter, damped with depth and towards the equator. */
function season(lat: number, depth: number, month: number): number {
  const peak = lat >= 0 ? 3 : 9;
  const strength = Math.min(1, Math.abs(lat) / 50) * Math.exp(-depth / 120);
  return strength * Math.cos((2 * Math.PI * (month - peak)) / 12);
}

/** Depth of the nutrient-depleted surface layer (m): deep in the gyres, none in the Southern Ocean. */
function depletedLayer(lat: number): number {
  return 60 * (1 - southern(lat)) * (1 - 0.6 * subpolarNorth(lat));
}

/** Surface dFe (nmol/kg): Saharan dust plume high, subtropical Pacific and Southern Ocean very low, a mid-range South Atlantic (so its low-iron cells are not confounded with low dFe). */
function surfaceFe(lat: number, lon: number): number {
  const fe =
    0.1 +
    0.4 * bump(lat, lon, 19, -30, 9, 22) +
    0.12 * bump(lat, lon, 46, -25, 8, 22) +
    0.05 * bump(lat, lon, -15, 80, 12, 25) -
    0.09 * bump(lat, lon, 24, -140, 13, 35) +
    0.02 * bump(lat, lon, -25, -12, 10, 22) -
    0.05 * southern(lat);
  return Math.max(0.012, fe);
}

/** Deep dFe plateau (nmol/kg), 0.6–0.8. */
function deepFe(lat: number, lon: number): number {
  return 0.6 + 0.15 * bump(lat, lon, 30, -30, 20, 35) + 0.06 * bump(lat, lon, 30, -150, 20, 40);
}

/** Surface nitrate (µmol/kg): near zero in the gyres, 20–30 in the Southern Ocean (HNLC), moderate subpolar north. */
function surfaceNitrate(lat: number, lon: number): number {
  return 0.03 + 24 * southern(lat) + 7 * subpolarNorth(lat) + 4 * bump(lat, lon, 0, -120, 4, 40);
}

/** Deep nitrate plateau (µmol/kg): lower in the North Atlantic, higher in the North Pacific. */
function deepNitrate(lat: number, lon: number): number {
  return 31 + 11 * bump(lat, lon, 15, -150, 35, 55) - 9 * bump(lat, lon, 30, -35, 25, 35) + 2 * southern(lat);
}

/** The true value of `quantity` at a position (degrees), depth (m) and month (1–12). */
export function truthField(quantity: FieldQuantity, lon: number, lat: number, depth: number, month: number): number {
  const s = season(lat, depth, month);
  const zc = depletedLayer(lat);
  const below = Math.max(0, depth - zc);
  switch (quantity) {
    case 'dissolved_fe': {
      // Iron stays at its surface value through the mixed layer (~40 m), then rises towards the deep plateau.
      const top = surfaceFe(lat, lon) * (1 + 0.15 * s);
      return top + (deepFe(lat, lon) - top) * (1 - Math.exp(-Math.max(0, depth - 40) / 450));
    }
    case 'nitrate': {
      const top = surfaceNitrate(lat, lon) * (1 + 0.3 * s);
      return top + (deepNitrate(lat, lon) - top) * (1 - Math.exp(-below / 450));
    }
    case 'phosphate':
      // Slight phosphate excess over N:P 16 at the surface, as in most of the ocean.
      return truthField('nitrate', lon, lat, depth, month) / 15 + 0.04;
    case 'silicate': {
      const top = 1 + 18 * southern(lat) * (1 + 0.3 * s);
      const deep = 25 + 110 * bump(lat, lon, 20, -150, 35, 55) + 80 * southern(lat) + 60 * bump(lat, lon, -20, 80, 25, 40);
      return top + (deep - top) * (1 - Math.exp(-below / 1200));
    }
    case 'temperature': {
      const top = 2 + 26 * Math.exp(-((lat / 45) ** 4)) - 1.5 * s;
      return 1.5 + (top - 1.5) * Math.exp(-depth / 600);
    }
    case 'salinity': {
      const top = 34.6 + 1.5 * Math.exp(-(((Math.abs(lat) - 23) / 12) ** 2)) + 0.5 * bump(lat, lon, 25, -35, 20, 30) - 0.7 * southern(lat);
      return 34.7 + (top - 34.7) * Math.exp(-depth / 500);
    }
  }
}
