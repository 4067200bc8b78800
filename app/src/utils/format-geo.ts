/** Display helpers for link geometry (distances, bearings, positions). */

const finite = (value: number | null | undefined): value is number =>
  typeof value === 'number' && Number.isFinite(value);

/** "872.6 km" — one decimal, as the link tables show. */
export const formatKm = (km: number | null | undefined): string =>
  finite(km)
    ? `${km.toLocaleString('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 })} km`
    : '—';

/** "311.2°" — a bearing clockwise from true north, one decimal, folded into [0, 360). */
export function formatBearing(deg: number | null | undefined): string {
  if (!finite(deg)) return '—';
  const folded = ((deg % 360) + 360) % 360;
  // 359.96 would print as 360.0°.
  const rounded = Math.round(folded * 10) / 10;
  return `${(rounded >= 360 ? 0 : rounded).toFixed(1)}°`;
}

/** "47.200° N, 8.600° E" — hemisphere letters instead of signs, three decimals (≈ 100 m). */
export function formatLatLon(latDeg: number | null | undefined, lonDeg: number | null | undefined) {
  if (!finite(latDeg) || !finite(lonDeg)) return '—';
  const lat = `${Math.abs(latDeg).toFixed(3)}° ${latDeg < 0 ? 'S' : 'N'}`;
  const lon = `${Math.abs(lonDeg).toFixed(3)}° ${lonDeg < 0 ? 'W' : 'E'}`;
  return `${lat}, ${lon}`;
}
