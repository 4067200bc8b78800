/** Colours for mode curves: our own ramp, one hue per curve by the golden angle so neighbours differ. */
export const MODE_COLORS = ['#137F7D', '#C0562A'];

const GOLDEN_ANGLE_DEG = 137.508;

/** A stable colour per curve name within one chart (teal first, then hues spread around the wheel). */
export function colorFor(names: readonly string[], name: string): string {
  const index = Math.max(0, names.indexOf(name));
  const hueDeg = (178 + index * GOLDEN_ANGLE_DEG) % 360;
  return `hsl(${hueDeg.toFixed(0)}, 62%, 40%)`;
}

/** The curve name of a mode: its label, plus the ray when both rays exist ("1F2 high"). */
export const curveName = (mode: { label: string; ray: 'low' | 'high' }) =>
  mode.ray === 'high' ? `${mode.label} high` : mode.label;

/** High (Pedersen) rays are drawn dashed. */
export const dashFor = (name: string) => (name.endsWith(' high') ? '5 3' : undefined);
