import {
  Inject,
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { MailSender } from '../mail/mail-sender.js';
import { PushSender, type SendOutcome } from '../push/push-sender.js';
import { noticeUrl, noticeMailText } from '../notices/notice-view.js';
import { DEFAULT_BACKOFF, nextAttemptAt, type BackoffOptions } from './backoff.js';
import { OutboxRepository, type ClaimedDelivery } from './outbox.repository.js';

export interface DrainResult {
  sent: number;
  retrying: number;
  failed: number;
}

const BATCH = 25;

/**
 * Drains the outbox: claims each due row atomically, sends it, and marks it `sent` only after the
 * push service or mail server acknowledged. Failures are retried with exponential backoff; a
 * 404/410 from a push service disables that subscription. Nothing is dropped while a service is
 * down: the row stays pending and is retried.
 */
@Injectable()
export class DeliveryWorker implements OnApplicationBootstrap, OnApplicationShutdown {
  private timer: NodeJS.Timeout | undefined;
  private draining: Promise<DrainResult> | undefined;
  private readonly log = new Logger('Delivery');
  backoff: BackoffOptions = DEFAULT_BACKOFF;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly outbox: OutboxRepository,
    private readonly push: PushSender,
    private readonly mail: MailSender,
  ) {}

  onApplicationBootstrap(): void {
    const every = this.config.delivery.deliveryIntervalMs;
    if (every > 0) {
      this.timer = setInterval(() => void this.drainOnce().catch(() => undefined), every);
      this.timer.unref();
    }
  }

  async onApplicationShutdown(): Promise<void> {
    clearInterval(this.timer);
    await this.draining?.catch(() => undefined);
  }

  /**
   * Sends every row due at `now` (tests pass a later `now` to skip a backoff wait). Ticks do not
   * overlap; the atomic claim would keep them from sending a row twice anyway.
   */
  drainOnce(now: Date = new Date()): Promise<DrainResult> {
    if (this.draining) return this.draining.then(() => this.drainOnce(now));
    this.draining = this.drain(now).finally(() => (this.draining = undefined));
    return this.draining;
  }

  private async drain(now: Date): Promise<DrainResult> {
    const result: DrainResult = { sent: 0, retrying: 0, failed: 0 };
    const tried = new Set<number>();
    for (;;) {
      const ids = this.outbox.dueIds(now, BATCH).filter((id) => !tried.has(id));
      if (ids.length === 0) return result;
      for (const id of ids) {
        tried.add(id);
        // The claim lasts leaseMs from now (not from the drain's start, which may be long past);
        // a server that died mid-send leaves the row claimable after it.
        const claimAt = new Date(Math.max(Date.now(), now.getTime()));
        const claimed = this.outbox.claim(id, claimAt, this.config.delivery.leaseMs);
        if (!claimed) continue;
        const outcome = await this.deliver(claimed);
        const at = new Date(Math.max(Date.now(), now.getTime()));
        if (outcome.ok) {
          this.outbox.markSent(id, at);
          result.sent++;
          continue;
        }
        const next = outcome.permanent
          ? undefined
          : nextAttemptAt(claimed.row.attempts, at, this.backoff, Math.random);
        if (next) {
          this.outbox.markRetry(id, next, outcome.error);
          result.retrying++;
        } else {
          this.outbox.markFailed(id, outcome.error);
          result.failed++;
          this.log.warn(`Gave up ${claimed.row.channel} delivery ${id}: ${outcome.error}`);
        }
      }
    }
  }

  private async deliver({ row, notice }: ClaimedDelivery): Promise<SendOutcome> {
    const url = `${this.config.delivery.publicUrl}${noticeUrl(notice)}`;
    if (row.channel === 'push') {
      const sub = this.outbox.pushSubscription(Number(row.target));
      if (!sub || sub.disabledAt) {
        return { ok: false, permanent: true, error: 'push subscription disabled' };
      }
      const outcome = await this.push.send(
        { endpoint: sub.endpoint, keys: sub.keys },
        { title: notice.title, body: notice.body, url },
      );
      if (!outcome.ok && outcome.gone) this.outbox.disablePushSubscription(sub.id, new Date());
      return outcome;
    }
    if (!this.mail.enabled) return { ok: false, permanent: true, error: 'e-mail not configured' };
    return this.mail.send({
      to: row.target,
      subject: `Hopwise: ${notice.title}`,
      text: noticeMailText(notice, url),
    });
  }
}
