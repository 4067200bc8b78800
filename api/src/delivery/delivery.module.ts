import { Module } from '@nestjs/common';
import { MailSender } from '../mail/mail-sender.js';
import { PushSender } from '../push/push-sender.js';
import { VapidKeysService } from '../push/vapid-keys.service.js';
import { StandInsService } from '../standins/standins.service.js';
import { DeliveryWorker } from './delivery-worker.js';
import { OutboxRepository } from './outbox.repository.js';

/** Outbox worker, Web Push and e-mail senders, VAPID keys and the loopback stand-ins. */
@Module({
  providers: [
    StandInsService,
    VapidKeysService,
    PushSender,
    MailSender,
    OutboxRepository,
    DeliveryWorker,
  ],
  exports: [StandInsService, VapidKeysService, DeliveryWorker, OutboxRepository, MailSender],
})
export class DeliveryModule {}
