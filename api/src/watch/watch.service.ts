import type { GeoPoint, PlanSlot } from '@hopwise/common';
import { pathGeometry } from '@hopwise/common';
import {
  Inject,
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import type { NoticeRow } from '../db/schema.js';
import { DeliveryWorker } from '../delivery/delivery-worker.js';
import { MailSender } from '../mail/mail-sender.js';
import { ConditionsEvents } from '../events/conditions-events.js';
import { NoticesRepository, type NewNotice } from '../notices/notices.repository.js';
import {
  currentAndNextSlotIndexes,
  evaluateSlot,
  worstPathSlot,
  type SlotState,
  type SlotSubject,
} from './evaluate.js';
import { WatchSources } from './watch-sources.js';

export interface WatchRunResult {
  evaluatedSlots: number;
  noticesStored: number;
  errors: string[];
}

interface Pending {
  notice: Omit<NewNotice, 'userId'>;
  userIds: number[];
}

/**
 * Re-evaluates every published net schedule and every followed link with the current conditions
 * (newest feed profile near the control point, else the built-in diurnal model) on each
 * conditions event and on a timer; stores the notices and their outbox rows in one transaction,
 * then asks the delivery worker to drain.
 */
@Injectable()
export class WatchService implements OnApplicationBootstrap, OnApplicationShutdown {
  private timer: NodeJS.Timeout | undefined;
  private unsubscribe: (() => void) | undefined;
  private running: Promise<WatchRunResult> | undefined;
  private again = false;
  private readonly log = new Logger('Watch');

  constructor(
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly sources: WatchSources,
    private readonly repo: NoticesRepository,
    private readonly events: ConditionsEvents,
    private readonly delivery: DeliveryWorker,
    private readonly mail: MailSender,
  ) {}

  onApplicationBootstrap(): void {
    this.unsubscribe = this.events.subscribe(() => this.trigger());
    const every = this.config.delivery.watchIntervalMs;
    if (every > 0) {
      this.timer = setInterval(() => this.trigger(), every);
      this.timer.unref();
    }
  }

  async onApplicationShutdown(): Promise<void> {
    this.unsubscribe?.();
    clearInterval(this.timer);
    await this.running?.catch(() => undefined);
  }

  /** Event/timer entry: coalesces bursts (one more run after the current one at most). */
  private trigger(): void {
    if (this.running) {
      this.again = true;
      return;
    }
    void this.runOnce()
      .then(() => this.delivery.drainOnce())
      .catch((err: unknown) => this.log.error(`Watch run failed: ${String(err)}`));
  }

  /** One evaluation of everything watched (tests call this). Runs never overlap. */
  runOnce(now: Date = new Date()): Promise<WatchRunResult> {
    if (this.running) return this.running.then(() => this.runOnce(now));
    this.running = this.evaluate(now).finally(() => {
      this.running = undefined;
      if (this.again) {
        this.again = false;
        this.trigger();
      }
    });
    return this.running;
  }

  private async conditionsFor(from: GeoPoint, to: GeoPoint) {
    const mid = pathGeometry(from, to).midpoint;
    const feed = await this.sources.latestFeedProfile(mid);
    return feed
      ? {
          profileSource: { profileId: feed.profileId },
          ref: `feed-${feed.profileId}`,
          label: `the conditions feed of ${feed.validAtUtc.slice(0, 16)}Z`,
        }
      : { profileSource: 'model' as const, ref: 'model', label: 'the diurnal model (approximate)' };
  }

  private planSlotFor(plan: PlanSlot[], slotStartUtc: string): PlanSlot | undefined {
    const tod = slotStartUtc.slice(11, 16);
    return plan.find((p) => p.startUtc.slice(11, 16) === tod);
  }

  private async evaluate(now: Date): Promise<WatchRunResult> {
    const result: WatchRunResult = { evaluatedSlots: 0, noticesStored: 0, errors: [] };
    const pending: Pending[] = [];
    const states: { key: string; value: Record<string, unknown> }[] = [];
    const dateUtc = now.toISOString().slice(0, 10);

    const judge = (subject: SlotSubject, stateKey: string, slot: PlanSlot, userIds: number[]) => {
      const previous = this.repo.watchStates([stateKey]).get(stateKey) as SlotState | undefined;
      const { changes, state } = evaluateSlot(subject, slot, previous);
      states.push({ key: stateKey, value: { ...state } });
      result.evaluatedSlots++;
      for (const c of changes) {
        pending.push({
          userIds,
          notice: {
            kind: c.kind,
            subjectType: subject.keyPrefix.startsWith('net:') ? 'net' : 'link',
            subjectId: Number(subject.keyPrefix.split(':')[1]),
            changeKey: c.key,
            title: c.title,
            body: c.body,
            data: c.data,
          },
        });
      }
    };

    for (const s of await this.sources.publishedSchedules()) {
      try {
        if (s.memberUserIds.length === 0 || s.channelsKHz.length === 0) continue;
        // A schedule for a day that is over has nothing in force any more.
        if (s.dateUtc < dateUtc) continue;
        const slotMinutes = slotMinutesOf(s.slotMinutes);
        // Every member path, each with the conditions at its own control point; a slot is judged
        // as the worst path sees it (the schedule's own rule). The schedule's day, so plan slots
        // and schedule slots share their start times.
        const conds = await Promise.all(s.paths.map((p) => this.conditionsFor(p.from, p.to)));
        const plans = await Promise.all(
          s.paths.map((p, k) =>
            this.sources.plan({
              from: p.from,
              to: p.to,
              dateUtc: s.dateUtc,
              channelsKHz: s.channelsKHz,
              profileSource: conds[k].profileSource,
              slotMinutes,
            }),
          ),
        );
        const cond = {
          ref: [...new Set(conds.map((c) => c.ref))].join('+'),
          label: [...new Set(conds.map((c) => c.label))].join(' and '),
        };
        const plan = {
          slots: plans[0].slots.map((_, i) => worstPathSlot(plans.map((p) => p.slots[i]))),
        };
        for (const i of currentAndNextSlotIndexes(
          s.slots.map((x) => x.startUtc),
          now,
        )) {
          const slot = s.slots[i]!;
          const planned = this.planSlotFor(plan.slots, slot.startUtc);
          if (!planned) continue;
          const prefix = `net:${s.netId}:v${s.version}`;
          judge(
            {
              keyPrefix: prefix,
              name: `Net "${s.netName}"`,
              slotStartUtc: slot.startUtc,
              channelInForceKHz: slot.channelKHz,
              overridden: slot.overridden,
              conditionsRef: cond.ref,
              conditionsLabel: cond.label,
            },
            `${prefix}:slot:${slot.startUtc.slice(11, 16)}`,
            planned,
            [...new Set(s.memberUserIds)],
          );
        }
      } catch (err: unknown) {
        result.errors.push(`net ${s.netId}: ${err instanceof Error ? err.message : String(err)}`);
      }
    }

    for (const f of this.repo.followedLinks()) {
      try {
        const cond = await this.conditionsFor(f.from, f.to);
        const plan = await this.sources.plan({
          from: f.from,
          to: f.to,
          dateUtc,
          channelsKHz: f.channelsKHz,
          profileSource: cond.profileSource,
          slotMinutes: 60,
        });
        for (const i of currentAndNextSlotIndexes(
          plan.slots.map((p) => p.startUtc),
          now,
        )) {
          const planned = plan.slots[i]!;
          const prefix = `link:${f.linkId}:u:${f.userId}`;
          judge(
            {
              keyPrefix: prefix,
              name: `Link "${f.linkName}"`,
              slotStartUtc: planned.startUtc,
              channelInForceKHz: f.watchChannelKHz,
              overridden: true, // no channel in force to compare the best with
              conditionsRef: cond.ref,
              conditionsLabel: cond.label,
            },
            `${prefix}:slot:${planned.startUtc.slice(11, 16)}`,
            planned,
            [f.userId],
          );
        }
      } catch (err: unknown) {
        result.errors.push(`link ${f.linkId}: ${err instanceof Error ? err.message : String(err)}`);
      }
    }

    const changes: NewNotice[] = pending.flatMap((p) =>
      p.userIds.map((userId) => ({ ...p.notice, userId })),
    );
    const inserted: NoticeRow[] = this.repo.storeChanges(changes, states, {
      push: true,
      email: this.mail.enabled,
    });
    result.noticesStored = inserted.length;
    for (const e of result.errors) this.log.warn(`Watch: ${e}`);
    return result;
  }
}

/** The plan's slot length for a schedule's (15, 30 or 60 min; 60 otherwise). */
function slotMinutesOf(minutes: number): 15 | 30 | 60 {
  return minutes === 15 || minutes === 30 ? minutes : 60;
}
