/** Mean Earth radius in km (IUGG mean radius R1; Moritz 2000, Geodetic Reference System 1980). */
export const EARTH_RADIUS_KM = 6371.0088;

const RAD = Math.PI / 180;

/** Great-circle distance in km between two points given in degrees, haversine formula on a sphere of radius EARTH_RADIUS_KM (Sinnott 1984). */
export function haversineKm(lon1: number, lat1: number, lon2: number, lat2: number): number {
  const sinDLat = Math.sin(((lat2 - lat1) * RAD) / 2);
  const sinDLon = Math.sin(((lon2 - lon1) * RAD) / 2);
  const h = sinDLat * sinDLat + Math.cos(lat1 * RAD) * Math.cos(lat2 * RAD) * sinDLon * sinDLon;
  return 2 * EARTH_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}
