import { Module } from '@nestjs/common';
import { DeliveryModule } from '../delivery/delivery.module.js';
import { LinksModule } from '../links/links.module.js';
import { LinkFollowController, NoticesController } from './notices.controller.js';
import { NoticesRepository } from './notices.repository.js';
import { NoticesService } from './notices.service.js';

/** Inbox, push subscriptions and link follows; the delivery worker runs in DeliveryModule. */
@Module({
  imports: [DeliveryModule, LinksModule],
  controllers: [NoticesController, LinkFollowController],
  providers: [NoticesService, NoticesRepository],
  exports: [NoticesRepository, DeliveryModule],
})
export class NoticesModule {}
