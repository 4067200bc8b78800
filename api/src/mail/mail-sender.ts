import { Inject, Injectable } from '@nestjs/common';
import nodemailer, { type Transporter } from 'nodemailer';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { StandInsService } from '../standins/standins.service.js';
import type { SendOutcome } from '../push/push-sender.js';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
}

/**
 * Sends e-mail through nodemailer: the real server of HOPWISE_SMTP_URL, else the loopback
 * stand-in (plain SMTP, STARTTLS off — STACK gotcha 10), else (production without SMTP) nothing.
 */
@Injectable()
export class MailSender {
  private transporter: Transporter | undefined;

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly standIns: StandInsService,
  ) {}

  get enabled(): boolean {
    return this.config.delivery.smtpUrl !== undefined || this.standIns.mail !== undefined;
  }

  private async transport(): Promise<Transporter> {
    if (this.transporter) return this.transporter;
    if (this.config.delivery.smtpUrl) {
      this.transporter = nodemailer.createTransport(this.config.delivery.smtpUrl);
    } else if (this.standIns.mail) {
      await this.standIns.ready();
      const url = new URL(this.standIns.mail.url);
      this.transporter = nodemailer.createTransport({
        host: url.hostname,
        port: Number(url.port),
        secure: false,
        ignoreTLS: true,
        connectionTimeout: 10_000,
      });
    } else {
      throw new Error('e-mail is not configured (HOPWISE_SMTP_URL)');
    }
    return this.transporter;
  }

  async send(message: MailMessage): Promise<SendOutcome> {
    try {
      const info = await (
        await this.transport()
      ).sendMail({
        from: this.config.delivery.mailFrom,
        to: message.to,
        subject: message.subject,
        text: message.text,
      });
      // Accepted by the server = acknowledged. A rejected recipient will not succeed on retry.
      if ((info.rejected?.length ?? 0) > 0 && (info.accepted?.length ?? 0) === 0) {
        return { ok: false, permanent: true, error: `recipient rejected: ${message.to}` };
      }
      return { ok: true };
    } catch (err: unknown) {
      const e = err as { responseCode?: number; message?: string };
      // SMTP 5xx = permanent failure (RFC 5321 §4.2.1); connection errors and 4xx = try again.
      const permanent = typeof e.responseCode === 'number' && e.responseCode >= 500;
      return { ok: false, permanent, error: e.message ?? String(err) };
    }
  }
}
