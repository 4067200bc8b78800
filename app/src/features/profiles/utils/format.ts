/** A number with fixed decimals, or an em dash when unknown. */
export function fixed(value: number | null | undefined, digits: number): string {
  return value === null || value === undefined || !Number.isFinite(value)
    ? '—'
    : value.toFixed(digits);
}

/** A signed difference ("+0.30", "−1.20", "±0.00"), or an em dash when either side is unknown. */
export function signedDifference(
  value: number | null | undefined,
  reference: number | null | undefined,
  digits: number,
): string {
  if (value === null || value === undefined || reference === null || reference === undefined) {
    return '—';
  }
  const delta = value - reference;
  const text = Math.abs(delta).toFixed(digits);
  if (Number(text) === 0) return `±${text}`;
  return delta > 0 ? `+${text}` : `−${text}`;
}

/** Electron density in the 1e11 /m³ form people read on charts: "2.45e11". */
export function density(value: number): string {
  return value === 0 ? '0' : value.toExponential(2).replace('e+', 'e');
}
