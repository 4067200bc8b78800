/** Channels typed as text ("4625, 6998 9145") → sorted unique kHz, or an error message. */
export function parseChannelsKHz(text: string): { channelsKHz: number[] } | { error: string } {
  const parts = text.split(/[\s,;]+/).filter(Boolean);
  if (parts.length === 0) return { error: 'Enter at least one channel in kHz.' };
  const values: number[] = [];
  for (const part of parts) {
    if (!/^\d+$/.test(part)) return { error: `“${part}” is not a whole number of kHz.` };
    const kHz = Number(part);
    if (kHz < 3000 || kHz > 30000) return { error: `${kHz} kHz is outside 3000–30000 kHz.` };
    values.push(kHz);
  }
  const channelsKHz = [...new Set(values)].sort((a, b) => a - b);
  if (channelsKHz.length > 50) return { error: 'At most 50 channels.' };
  return { channelsKHz };
}

/** 14 100 kHz, grouped with narrow no-break spaces (SI style) so a channel never wraps. */
export const formatKHz = (kHz: number) =>
  `${kHz.toLocaleString('en-US').replace(/,/g, '\u202f')}\u00a0kHz`;
