import { Inject, Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { MailStandIn } from './mail/mail-standin.js';
import { PushStandIn } from './push/push-standin.js';

/**
 * Starts the loopback push and mail stand-ins in-process when the configuration asks for them
 * (default outside production). Senders wait for `ready()` before using them.
 */
@Injectable()
export class StandInsService implements OnApplicationShutdown {
  readonly push: PushStandIn | undefined;
  readonly mail: MailStandIn | undefined;
  private readonly started: Promise<void>;
  private readonly log = new Logger('StandIns');

  constructor(@Inject(APP_CONFIG) config: AppConfig) {
    this.push = config.delivery.pushStandIn ? new PushStandIn() : undefined;
    this.mail = config.delivery.mailStandIn ? new MailStandIn() : undefined;
    this.started = this.startAll();
    // Senders see the error through ready() (their rows stay pending and are retried).
    this.started.catch((err: unknown) =>
      this.log.error(
        `Stand-ins failed to start: ${err instanceof Error ? err.message : String(err)}`,
      ),
    );
  }

  private async startAll(): Promise<void> {
    if (this.push) {
      await this.push.start();
      this.log.log(`Push stand-in at ${this.push.baseUrl} (GET /received)`);
    }
    if (this.mail) {
      await this.mail.start();
      this.log.log(`Mail stand-in at ${this.mail.url}`);
    }
  }

  ready(): Promise<void> {
    return this.started;
  }

  async onApplicationShutdown(): Promise<void> {
    await this.started.catch(() => undefined);
    await Promise.all([this.push?.stop(), this.mail?.stop()]);
  }
}
