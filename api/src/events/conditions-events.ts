import { EventEmitter } from 'node:events';
import { Global, Injectable, Logger, Module, type OnModuleDestroy } from '@nestjs/common';

/** A feed update was stored as a profile (source 'feed'). */
export interface FeedUpdateEvent {
  type: 'feed-update';
  profileId: number;
  region: string;
  validAtUtc: string;
}

/** A net schedule was published as `version`. */
export interface SchedulePublishedEvent {
  type: 'schedule-published';
  netId: number;
  version: number;
}

/** A profile in the library was created, replaced or deleted. */
export interface ProfileChangedEvent {
  type: 'profile-changed';
  profileId: number;
}

export type ConditionsEvent = FeedUpdateEvent | SchedulePublishedEvent | ProfileChangedEvent;
export type ConditionsEventHandler = (event: ConditionsEvent) => void | Promise<void>;

const CHANNEL = 'conditions';

/**
 * In-process bus between the conditions/nets side (emitters) and the watch (listener).
 * Handlers run after the emitting call returns (queued as a microtask), so a slow or failing
 * listener never breaks the write that emitted the event.
 */
@Injectable()
export class ConditionsEvents implements OnModuleDestroy {
  private readonly emitter = new EventEmitter();

  constructor() {
    this.emitter.setMaxListeners(50);
  }

  private readonly logger = new Logger('ConditionsEvents');

  emit(event: ConditionsEvent): void {
    queueMicrotask(() => this.emitter.emit(CHANNEL, event));
  }

  /** Returns the function that removes the handler. */
  subscribe(handler: ConditionsEventHandler): () => void {
    const listener = (event: ConditionsEvent) => {
      void Promise.resolve()
        .then(() => handler(event))
        .catch((err: unknown) => {
          this.logger.error(`A conditions-event handler failed: ${String(err)}`);
        });
    };
    this.emitter.on(CHANNEL, listener);
    return () => this.emitter.off(CHANNEL, listener);
  }

  onModuleDestroy(): void {
    this.emitter.removeAllListeners();
  }
}

/** Global: any module may inject ConditionsEvents without importing this module. */
@Global()
@Module({ providers: [ConditionsEvents], exports: [ConditionsEvents] })
export class EventsModule {}
