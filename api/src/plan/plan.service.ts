import {
  computeErrorStatus,
  parsePlanRequest,
  pathGeometry,
  type GeoPoint,
  type PlanProfileSource,
  type PlanResponse,
  type ProfileData,
  type UserView,
} from '@hopwise/common';
import { Injectable, Logger } from '@nestjs/common';
import { ComputeService } from '../compute/compute.service.js';
import { ConditionsService } from '../conditions/conditions.service.js';
import { ApiException, badRequest } from '../http/api-error.js';
import { LinksService } from '../links/links.service.js';
import { ProfileLookup } from '../profiles/profile-lookup.js';
import { StationsRepository } from '../stations/stations.repository.js';

export interface PlanForLinkInput {
  from: GeoPoint;
  to: GeoPoint;
  dateUtc: string;
  channelsKHz: number[];
  profileSource: PlanProfileSource;
  slotMinutes?: number;
}

/**
 * `POST /api/compute/plan` (SPEC §3): the pure plan of common/src/conditions/plan.ts with the
 * profile at the control point from the diurnal model, the latest feed update of the region
 * nearest the control point, or a stored profile the user may see.
 * The route's plan runs in the compute worker pool (ComputeService: time limit, result cache), as
 * a 24-slot plan takes ~0.1–0.4 s (scripts/bench.mjs `plan`); the request is parsed and the link
 * and profile source are resolved here first. Nets' schedules and the watch plan the same way.
 */
@Injectable()
export class PlanService {
  private readonly logger = new Logger('Plan');

  constructor(
    private readonly links: LinksService,
    private readonly stations: StationsRepository,
    private readonly profiles: ProfileLookup,
    private readonly conditions: ConditionsService,
    private readonly compute: ComputeService,
  ) {}

  /** The route: parse (400 naming the field), resolve the link, plan (in the worker pool). */
  async planFromBody(body: unknown, user: UserView): Promise<PlanResponse> {
    const req = this.guard(() => parsePlanRequest(body));
    let from = req.from as GeoPoint | undefined;
    let to = req.to as GeoPoint | undefined;
    if (req.linkId !== undefined) {
      const link = this.links.findVisible(user, req.linkId);
      const ends = link && this.stations.findByIds([link.fromStationId, link.toStationId]);
      const a = ends?.find((s) => s.id === link?.fromStationId);
      const b = ends?.find((s) => s.id === link?.toStationId);
      if (!a || !b) {
        throw badRequest(`linkId: no link with id ${req.linkId}`, {
          linkId: `no link with id ${req.linkId}`,
        });
      }
      from = { latDeg: a.latDeg, lonDeg: a.lonDeg };
      to = { latDeg: b.latDeg, lonDeg: b.lonDeg };
    }
    return this.planForLink(
      {
        from: from as GeoPoint,
        to: to as GeoPoint,
        dateUtc: req.dateUtc,
        channelsKHz: req.channelsKHz,
        profileSource: req.profileSource,
        slotMinutes: req.slotMinutes,
      },
      user,
    );
  }

  /**
   * The plan for a path, in the worker pool (also used by nets and the watch). `user` decides
   * which stored profiles may be used; without one (the system) any live profile may.
   */
  planForLink(input: PlanForLinkInput, user?: UserView): Promise<PlanResponse> {
    return this.compute.plan({
      from: input.from,
      to: input.to,
      dateUtc: input.dateUtc,
      channelsKHz: input.channelsKHz,
      slotMinutes: input.slotMinutes ?? 60,
      profile: this.profileSourceFor(input.profileSource, input.from, input.to, user),
    });
  }

  /** `'model'` (the diurnal model per slot), or the feed's or a stored profile's data. */
  private profileSourceFor(
    source: PlanProfileSource,
    from: GeoPoint,
    to: GeoPoint,
    user: UserView | undefined,
  ): 'model' | ProfileData {
    if (source === 'model') return 'model';
    if (source === 'feed') {
      const mid = pathGeometry(from, to).midpoint;
      const latest = this.conditions.latestFeedProfile(mid);
      if (!latest) {
        throw new ApiException(
          422,
          'profileSource: no conditions feed update has been received yet',
          {
            profileSource: 'no conditions feed update yet',
          },
        );
      }
      return latest.profile;
    }
    const stored = user
      ? this.profiles.resolveForUser(source.profileId, user)
      : this.profiles.resolveForUser(source.profileId, SYSTEM_VIEWER);
    if (!stored) {
      throw badRequest(`profileSource.profileId: no profile with id ${source.profileId}`, {
        'profileSource.profileId': `no profile with id ${source.profileId}`,
      });
    }
    return stored;
  }

  /** Physics/validation errors → the one error shape (400/422), never 500 for user input. */
  private guard<T>(fn: () => T): T {
    try {
      return fn();
    } catch (err) {
      if (err instanceof ApiException) throw err;
      const mapped = computeErrorStatus(err);
      if (mapped.status === 500) {
        this.logger.error(err);
        throw err;
      }
      throw new ApiException(mapped.status, mapped.message, mapped.fields);
    }
  }
}

/** The system sees every live profile (admin rights) when planning for published schedules. */
const SYSTEM_VIEWER: UserView = {
  id: 0,
  email: 'system',
  displayName: 'system',
  role: 'admin',
  disabled: false,
  createdAt: '1970-01-01T00:00:00.000Z',
};
