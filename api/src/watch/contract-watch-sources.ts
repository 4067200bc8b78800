import type { GeoPoint, PlanResponse } from '@hopwise/common';
import { Injectable } from '@nestjs/common';
import { ConditionsService } from '../conditions/conditions.service.js';
import { NetsService } from '../nets/nets.service.js';
import { PlanService } from '../plan/plan.service.js';
import { WatchSources, type WatchPlanRequest, type WatchedSchedule } from './watch-sources.js';

/**
 * A feed region farther than this from a path's control point does not describe its conditions;
 * the watch then uses the diurnal model. [km] (our choice: about the size of a feed region's
 * "nearby" area for mid-latitude F2 correlation, which falls off over ~1000–3000 km — from memory).
 */
export const FEED_REACH_KM = 3000;

/** WatchSources over the nets, plan and conditions services. */
@Injectable()
export class ContractWatchSources extends WatchSources {
  constructor(
    private readonly nets: NetsService,
    private readonly planner: PlanService,
    private readonly conditions: ConditionsService,
  ) {
    super();
  }

  publishedSchedules(): WatchedSchedule[] {
    return this.nets.publishedSchedules().map((s) => ({
      netId: s.netId,
      netName: s.netName,
      version: s.version,
      dateUtc: s.dateUtc,
      slotMinutes: s.slotMinutes,
      memberUserIds: s.memberUserIds,
      channelsKHz: s.channelsKHz,
      paths: s.paths.map((p) => ({ from: p.from, to: p.to })),
      slots: s.slots.map((x) => ({
        startUtc: x.startUtc,
        channelKHz: x.channelKHz,
        overridden: x.overridden,
      })),
    }));
  }

  plan(request: WatchPlanRequest): Promise<PlanResponse> {
    return this.planner.planForLink(request);
  }

  latestFeedProfile(point: GeoPoint) {
    const latest = this.conditions.latestFeedProfile(point);
    if (!latest || (latest.distanceKm ?? 0) > FEED_REACH_KM) return Promise.resolve(undefined);
    return Promise.resolve({ profileId: latest.profileId, validAtUtc: latest.validAtUtc });
  }
}
