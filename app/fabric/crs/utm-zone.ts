/**
 * EPSG code of the WGS 84 / UTM zone holding a point (degrees, WGS84):
 * 326zz north of the equator, 327zz south. Follows the UTM grid's special
 * zones for south-west Norway (32V) and Svalbard (31X–37X).
 */
export function utmZoneFor(lon: number, lat: number): number {
  if (!Number.isFinite(lon) || !Number.isFinite(lat) || Math.abs(lat) > 90) {
    throw new RangeError(`not a WGS84 longitude/latitude: (${lon}, ${lat})`);
  }
  // 180° itself stays in zone 60 (its east edge) rather than wrapping to zone 1.
  const wrapped = lon >= -180 && lon <= 180 ? lon : ((((lon + 180) % 360) + 360) % 360) - 180;
  let zone = Math.min(60, Math.floor((wrapped + 180) / 6) + 1);
  if (lat >= 56 && lat < 64 && wrapped >= 3 && wrapped < 12) zone = 32;
  if (lat >= 72 && lat < 84 && wrapped >= 0 && wrapped < 42) {
    zone = wrapped < 9 ? 31 : wrapped < 21 ? 33 : wrapped < 33 ? 35 : 37;
  }
  return (lat >= 0 ? 32600 : 32700) + zone;
}
