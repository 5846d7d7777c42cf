/** A position in decimal degrees (WGS84). */
export type LatLon = { lat: number; lon: number };

/** Mean Earth radius R1 = (2a + b) / 3 from WGS84 (IUGG; Moritz 1980), in km. */
export const EARTH_MEAN_RADIUS_KM = 6371.0088;

const toRad = (deg: number) => (deg * Math.PI) / 180;
const toDeg = (rad: number) => (rad * 180) / Math.PI;

/** Central angle between two positions in radians (haversine form, stable for short distances). */
function centralAngleRad(from: LatLon, to: LatLon): number {
  const dLat = toRad(to.lat - from.lat);
  const dLon = toRad(to.lon - from.lon);
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(toRad(from.lat)) * Math.cos(toRad(to.lat)) * Math.sin(dLon / 2) ** 2;
  return 2 * Math.asin(Math.min(1, Math.sqrt(h)));
}

/** Great-circle distance in km by the haversine formula, on a sphere of `radiusKm`. */
export function haversineKm(from: LatLon, to: LatLon, radiusKm: number = EARTH_MEAN_RADIUS_KM): number {
  return centralAngleRad(from, to) * radiusKm;
}

/**
 * The point a `fraction` (0 = from, 1 = to) of the way along the great circle between two
 * positions (spherical linear interpolation). Antipodal pairs have no single great circle;
 * the caller never asks for one inside the US.
 */
export function interpolateGreatCircle(from: LatLon, to: LatLon, fraction: number): LatLon {
  const delta = centralAngleRad(from, to);
  if (delta < 1e-12) return { lat: from.lat, lon: from.lon };
  const a = Math.sin((1 - fraction) * delta) / Math.sin(delta);
  const b = Math.sin(fraction * delta) / Math.sin(delta);
  const [lat1, lon1, lat2, lon2] = [toRad(from.lat), toRad(from.lon), toRad(to.lat), toRad(to.lon)];
  const x = a * Math.cos(lat1) * Math.cos(lon1) + b * Math.cos(lat2) * Math.cos(lon2);
  const y = a * Math.cos(lat1) * Math.sin(lon1) + b * Math.cos(lat2) * Math.sin(lon2);
  const z = a * Math.sin(lat1) + b * Math.sin(lat2);
  return { lat: toDeg(Math.atan2(z, Math.hypot(x, y))), lon: toDeg(Math.atan2(y, x)) };
}
