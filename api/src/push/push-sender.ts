import { Agent } from 'node:https';
import { rootCertificates } from 'node:tls';
import type { PushPayload } from '@hopwise/common';
import { Inject, Injectable } from '@nestjs/common';
import webpush, { WebPushError } from 'web-push';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { StandInsService } from '../standins/standins.service.js';
import { VapidKeysService } from './vapid-keys.service.js';

export type SendOutcome =
  { ok: true } | { ok: false; permanent: boolean; gone?: boolean; error: string };

const PUSH_TTL_S = 6 * 3600;
const PUSH_TIMEOUT_MS = 15_000;

/**
 * Sends one Web Push message (RFC 8030) with VAPID (RFC 8292); web-push encrypts the payload as
 * aes128gcm (RFC 8291). With the stand-in on, the https agent trusts its self-signed certificate
 * as well as the usual roots (STACK gotcha 9).
 */
@Injectable()
export class PushSender {
  private agent: Agent | undefined;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly vapid: VapidKeysService,
    private readonly standIns: StandInsService,
  ) {}

  private async httpsAgent(): Promise<Agent | undefined> {
    if (!this.standIns.push) return undefined;
    if (!this.agent) {
      await this.standIns.ready();
      this.agent = new Agent({
        ca: [...rootCertificates, this.standIns.push.certificatePem],
        keepAlive: false,
      });
    }
    return this.agent;
  }

  async send(
    subscription: { endpoint: string; keys: { p256dh: string; auth: string } },
    payload: PushPayload,
  ): Promise<SendOutcome> {
    const keys = this.vapid.get();
    try {
      await webpush.sendNotification(subscription, JSON.stringify(payload), {
        TTL: PUSH_TTL_S,
        contentEncoding: 'aes128gcm',
        vapidDetails: {
          subject: this.config.delivery.vapidSubject,
          publicKey: keys.publicKey,
          privateKey: keys.privateKey,
        },
        agent: await this.httpsAgent(),
        timeout: PUSH_TIMEOUT_MS,
      });
      return { ok: true };
    } catch (err: unknown) {
      if (err instanceof WebPushError) {
        const status = err.statusCode;
        const gone = status === 404 || status === 410;
        // 400/413: the request itself is wrong; retrying cannot help. 429/5xx: try again later.
        const permanent = gone || status === 400 || status === 413;
        return { ok: false, permanent, gone, error: `push service answered ${status}` };
      }
      const message = err instanceof Error ? err.message : String(err);
      // Bad keys in a stored subscription make web-push throw before sending.
      const permanent =
        /p256dh|auth|subscription/i.test(message) && !/ECONN|ETIMEDOUT/.test(message);
      return { ok: false, permanent, error: message };
    }
  }
}
