import { describe, expect, it } from 'vitest';
import { base64UrlToBytes, pushUnsupportedReason } from './use-push-subscription';

const capable = {
  isSecureContext: true,
  hasServiceWorker: true,
  hasPushManager: true,
  hasNotification: true,
};

describe('push opt-in: can this browser subscribe?', () => {
  it('accepts a secure context with service workers, the Push API and notifications', () => {
    expect(pushUnsupportedReason(capable)).toBeUndefined();
  });

  it('names the missing piece in plain words', () => {
    expect(pushUnsupportedReason({ ...capable, isSecureContext: false })).toMatch(
      /secure connection/,
    );
    expect(pushUnsupportedReason({ ...capable, hasServiceWorker: false })).toMatch(
      /service workers/,
    );
    expect(pushUnsupportedReason({ ...capable, hasPushManager: false })).toMatch(/Push API/);
    expect(pushUnsupportedReason({ ...capable, hasNotification: false })).toMatch(/Push API/);
  });
});

describe('VAPID key decoding', () => {
  it('decodes base64url without padding (RFC 4648 §5)', () => {
    // "hi?>" → base64 "aGk/Pg==" → base64url "aGk_Pg"
    expect([...base64UrlToBytes('aGk_Pg')]).toEqual([0x68, 0x69, 0x3f, 0x3e]);
  });

  it('gives 65 bytes for an uncompressed P-256 public key', () => {
    const key = `B${'A'.repeat(86)}`; // 87 base64url characters = 65 bytes
    expect(base64UrlToBytes(key)).toHaveLength(65);
  });
});
