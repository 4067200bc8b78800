import { describe, expect, it } from 'vitest';
import { formatBearing, formatKm, formatLatLon } from './format-geo';

describe('formatKm', () => {
  it('shows one decimal and the unit', () => {
    expect(formatKm(872.6053)).toBe('872.6 km');
    expect(formatKm(12_345.04)).toBe('12,345.0 km');
  });
  it('shows a dash for a missing value', () => {
    expect(formatKm(undefined)).toBe('—');
    expect(formatKm(Number.NaN)).toBe('—');
  });
});

describe('formatBearing', () => {
  it('folds into [0, 360) and rounds to 0.1°', () => {
    expect(formatBearing(311.238)).toBe('311.2°');
    expect(formatBearing(-45)).toBe('315.0°');
    expect(formatBearing(359.97)).toBe('0.0°');
  });
});

describe('formatLatLon', () => {
  it('uses hemisphere letters', () => {
    expect(formatLatLon(47.2, 8.6)).toBe('47.200° N, 8.600° E');
    expect(formatLatLon(-33.9, -70.65)).toBe('33.900° S, 70.650° W');
  });
});
