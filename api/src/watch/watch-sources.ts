import type { GeoPoint, PlanProfileSource, PlanResponse } from '@hopwise/common';

/** A published net schedule as the watch needs it (NetsService.publishedSchedules()). */
export interface WatchedSchedule {
  netId: number;
  netName: string;
  version: number;
  /** The UTC day the schedule is for (YYYY-MM-DD) and its slot length. */
  dateUtc: string;
  slotMinutes: number;
  memberUserIds: number[];
  channelsKHz: number[];
  /** Every member path: control station → member (at least one). */
  paths: { from: GeoPoint; to: GeoPoint }[];
  slots: { startUtc: string; channelKHz: number | null; overridden: boolean }[];
}

export interface WatchPlanRequest {
  from: GeoPoint;
  to: GeoPoint;
  dateUtc: string;
  channelsKHz: number[];
  profileSource: PlanProfileSource;
  slotMinutes?: 15 | 30 | 60;
}

/**
 * What the watch reads from the conditions/plan/nets side. Bound in WatchModule to the services
 * of those modules; a test may bind its own.
 */
export abstract class WatchSources {
  abstract publishedSchedules(): Promise<WatchedSchedule[]> | WatchedSchedule[];
  abstract plan(request: WatchPlanRequest): Promise<PlanResponse>;
  /** The newest feed profile for the region around `point`, if any. */
  abstract latestFeedProfile(
    point: GeoPoint,
  ): Promise<{ profileId: number; validAtUtc: string } | undefined>;
}
