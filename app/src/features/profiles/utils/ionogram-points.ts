import type { VerticalEcho } from '../api/types';

export interface ChartPoint {
  x: number;
  y: number | null;
}

/**
 * Echoes as chart points (frequency MHz, virtual height km). Non-reflected frequencies and
 * virtual heights above `ceilingKm` (the group retardation near a critical frequency grows without
 * bound) become gaps (`y: null`), so the chart breaks the line instead of drawing a spike.
 */
export function ionogramPoints(echoes: readonly VerticalEcho[], ceilingKm: number): ChartPoint[] {
  return echoes.map((echo) => ({
    x: echo.frequencyMHz,
    y:
      echo.reflected && echo.virtualHeightKm !== null && echo.virtualHeightKm <= ceilingKm
        ? echo.virtualHeightKm
        : null,
  }));
}

/** A height ceiling for an ionogram chart: the lowest multiple of 100 km above most echoes. */
export function ionogramCeilingKm(echoHeightsKm: readonly number[], fallbackKm = 800): number {
  const finite = echoHeightsKm.filter((h) => Number.isFinite(h)).sort((a, b) => a - b);
  if (finite.length === 0) return fallbackKm;
  // The 90th percentile keeps the cusps from setting the scale.
  const p90 = finite[Math.min(finite.length - 1, Math.floor(finite.length * 0.9))];
  return Math.min(2000, Math.max(300, Math.ceil((p90 * 1.4) / 100) * 100));
}
