import { createDecipheriv, createECDH, hkdfSync, randomBytes } from 'node:crypto';

/**
 * A Web Push subscriber's side, for tests: the key pair and auth secret a browser would make, and
 * the decryption of an `aes128gcm` push message body.
 *
 * RFC 8291 (Message Encryption for Web Push) §3.3–3.4 and RFC 8188 (Encrypted Content-Encoding
 * for HTTP, "aes128gcm") §2:
 *   header = salt (16) ‖ rs (uint32 BE) ‖ idlen (1) ‖ keyid (= sender's ephemeral P-256 key, 65)
 *   ecdh_secret = ECDH(ua_private, as_public)
 *   IKM   = HKDF(salt = auth_secret, IKM = ecdh_secret,
 *                info = "WebPush: info" ‖ 0x00 ‖ ua_public ‖ as_public, L = 32)
 *   CEK   = HKDF(salt, IKM, "Content-Encoding: aes128gcm" ‖ 0x00, 16)
 *   NONCE = HKDF(salt, IKM, "Content-Encoding: nonce" ‖ 0x00, 12)
 *   one record: AES-128-GCM(CEK, NONCE) of plaintext ‖ 0x02 ‖ zero padding (last record), tag 16.
 */
export interface TestSubscriber {
  keys: { p256dh: string; auth: string };
  decrypt(body: Buffer): string;
}

export function makeSubscriber(): TestSubscriber {
  const ecdh = createECDH('prime256v1');
  const uaPublic = ecdh.generateKeys(); // uncompressed point, 65 bytes
  const authSecret = randomBytes(16);
  return {
    keys: { p256dh: uaPublic.toString('base64url'), auth: authSecret.toString('base64url') },
    decrypt(body: Buffer): string {
      const salt = body.subarray(0, 16);
      const rs = body.readUInt32BE(16);
      const idLength = body[20]!;
      const asPublic = body.subarray(21, 21 + idLength);
      const ciphertext = body.subarray(21 + idLength);
      if (ciphertext.length > rs) throw new Error('more than one record: not expected here');
      const ecdhSecret = ecdh.computeSecret(asPublic);
      const keyInfo = Buffer.concat([Buffer.from('WebPush: info\0'), uaPublic, asPublic]);
      const ikm = Buffer.from(hkdfSync('sha256', ecdhSecret, authSecret, keyInfo, 32));
      const cek = Buffer.from(
        hkdfSync('sha256', ikm, salt, Buffer.from('Content-Encoding: aes128gcm\0'), 16),
      );
      const nonce = Buffer.from(
        hkdfSync('sha256', ikm, salt, Buffer.from('Content-Encoding: nonce\0'), 12),
      );
      const tag = ciphertext.subarray(ciphertext.length - 16);
      const decipher = createDecipheriv('aes-128-gcm', cek, nonce);
      decipher.setAuthTag(tag);
      const padded = Buffer.concat([
        decipher.update(ciphertext.subarray(0, ciphertext.length - 16)),
        decipher.final(),
      ]);
      // Strip the padding: trailing zeros, then the 0x02 delimiter of the last record.
      let end = padded.length - 1;
      while (end >= 0 && padded[end] === 0) end--;
      if (padded[end] !== 2) throw new Error('missing last-record delimiter 0x02 (RFC 8188 §2)');
      return padded.subarray(0, end).toString('utf8');
    },
  };
}
