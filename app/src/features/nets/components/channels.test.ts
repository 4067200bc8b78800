import { describe, expect, it } from 'vitest';
import { parseChannelsKHz } from './channels';

describe('parseChannelsKHz', () => {
  it('accepts commas and spaces, sorts and removes duplicates', () => {
    expect(parseChannelsKHz('9145, 4625 6998,4625')).toEqual({ channelsKHz: [4625, 6998, 9145] });
  });

  it('rejects non-integers and channels outside 3000–30000 kHz, naming the value', () => {
    expect(parseChannelsKHz('7045.5')).toEqual({ error: '“7045.5” is not a whole number of kHz.' });
    expect(parseChannelsKHz('2999')).toEqual({ error: '2999 kHz is outside 3000–30000 kHz.' });
    expect(parseChannelsKHz('30001')).toEqual({ error: '30001 kHz is outside 3000–30000 kHz.' });
    expect(parseChannelsKHz('  ')).toEqual({ error: 'Enter at least one channel in kHz.' });
  });
});
