import {
  diurnalModel,
  pathGeometry,
  type DiurnalModelResult,
  type GeoPoint,
  type ProfileData,
} from '@hopwise/common';
import {
  Inject,
  Injectable,
  Logger,
  type OnApplicationBootstrap,
  type OnApplicationShutdown,
} from '@nestjs/common';
import { z } from 'zod';
import { toUserView } from '../auth/auth-user.js';
import { ConditionsEvents } from '../events/conditions-events.js';
import { ApiException } from '../http/api-error.js';
import { ProfilesService } from '../profiles/profiles.service.js';
import { FeedStandin } from '../standins/feed/feed-standin.js';
import { ConditionsRepository } from './conditions.repository.js';
import { FEED_CONFIG, type FeedConfig } from './feed-config.js';

const layerSchema = z.looseObject({ name: z.string(), shape: z.string() });
const feedResponseSchema = z.object({
  feedId: z.string().min(1),
  lastSeq: z.number().int().nonnegative(),
  updates: z.array(
    z.object({
      seq: z.number().int().positive(),
      region: z.string().min(1),
      latDeg: z.number().min(-90).max(90),
      lonDeg: z.number().min(-180).max(180),
      validAtUtc: z.iso.datetime(),
      layers: z.array(layerSchema).min(1),
    }),
  ),
});
type FeedResponse = z.infer<typeof feedResponseSchema>;

export interface PollResult {
  feedId: string;
  /** Updates stored by this poll (each exactly once). */
  stored: number;
  /** Updates skipped because they were already stored or invalid. */
  skipped: number;
  lastSeq: number;
}

export interface LatestFeedProfile {
  profileId: number;
  region: string;
  latDeg: number;
  lonDeg: number;
  validAtUtc: string;
  /** Great-circle distance from the asked point to the region centre (R₀ = 6371 km). */
  distanceKm?: number;
  profile: ProfileData;
}

const FETCH_TIMEOUT_MS = 10_000;
const FIRST_POLL_DELAY_MS = 1000;

/**
 * The conditions feed: polls it (HOPWISE_FEED_POLL_MS; on demand through POST /api/conditions/poll),
 * stores each update as a library profile (source 'feed', published, owned by the site's first
 * admin) and its (feedId, seq) in one transaction — the unique (feed, seq) index means an update is
 * never stored twice, and the next poll resumes after the last stored seq, so an update missed
 * while the feed was down is fetched later (nothing lost). Polls are serialised.
 * Starts the in-process stand-in (invented demo data) when HOPWISE_FEED_URL is unset.
 */
@Injectable()
export class ConditionsService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('ConditionsFeed');
  private timer?: NodeJS.Timeout;
  private interval?: NodeJS.Timeout;
  private chain: Promise<unknown> = Promise.resolve();
  /** The in-process stand-in, when this server started one. */
  readonly standin?: FeedStandin;

  constructor(
    @Inject(FEED_CONFIG) private readonly config: FeedConfig,
    private readonly repo: ConditionsRepository,
    private readonly profiles: ProfilesService,
    private readonly events: ConditionsEvents,
  ) {
    if (!config.feedUrl && config.standIn) this.standin = new FeedStandin();
  }

  get feedUrl(): string | undefined {
    return this.config.feedUrl ?? this.standin?.url;
  }

  async onApplicationBootstrap(): Promise<void> {
    if (this.standin) {
      const url = await this.standin.start();
      this.logger.log(`Conditions feed stand-in (invented demo data) on ${url}`);
    }
    if (!this.feedUrl) {
      this.logger.warn('No conditions feed (HOPWISE_FEED_URL unset, HOPWISE_FEED_STANDIN=0)');
      return;
    }
    if (this.config.pollMs > 0) {
      const tick = () => void this.poll().catch(() => undefined);
      // First poll soon after start-up (after the demo seed), then every pollMs.
      this.timer = setTimeout(tick, FIRST_POLL_DELAY_MS).unref();
      this.interval = setInterval(tick, this.config.pollMs).unref();
    }
  }

  async onApplicationShutdown(): Promise<void> {
    clearTimeout(this.timer);
    clearInterval(this.interval);
    await this.chain.catch(() => undefined);
    await this.standin?.stop();
  }

  /** One poll, queued behind any running one. Throws ApiException 503 if the feed is unreachable. */
  poll(): Promise<PollResult> {
    const run = this.chain.catch(() => undefined).then(() => this.pollOnce());
    this.chain = run;
    return run;
  }

  private async pollOnce(): Promise<PollResult> {
    const url = this.feedUrl;
    if (!url) throw new ApiException(503, 'No conditions feed is configured');
    const owner = this.repo.feedOwner();
    if (!owner) {
      throw new ApiException(503, 'No admin account to own feed profiles yet; will retry');
    }
    const knownFeed = this.repo.latestFeedId();
    let response = await this.fetchUpdates(url, knownFeed ? this.repo.lastSeq(knownFeed) : 0);
    if (response.feedId !== knownFeed) {
      // A different (e.g. restarted) feed: resume from what we hold of that one.
      const since = this.repo.lastSeq(response.feedId);
      if (since !== (knownFeed ? this.repo.lastSeq(knownFeed) : 0)) {
        response = await this.fetchUpdates(url, since);
      }
    }
    const ownerView = toUserView(owner);
    let stored = 0;
    let skipped = 0;
    const emitted: { profileId: number; region: string; validAtUtc: string }[] = [];
    for (const u of [...response.updates].sort((a, b) => a.seq - b.seq)) {
      try {
        const row = this.repo.transaction(() => {
          if (this.repo.has(response.feedId, u.seq)) return undefined;
          const profile = this.profiles.store(
            ownerView,
            {
              name: `Feed ${u.region} ${u.validAtUtc.slice(0, 16)}Z`,
              source: 'feed',
              profile: { layers: u.layers } as unknown as ProfileData,
              validAtUtc: u.validAtUtc,
              latDeg: u.latDeg,
              lonDeg: u.lonDeg,
              published: true,
              provenance: { feedSeq: u.seq, region: u.region, feedId: response.feedId },
            },
            null,
          );
          return this.repo.insert({
            ownerId: owner.id,
            feedId: response.feedId,
            seq: u.seq,
            region: u.region,
            latDeg: u.latDeg,
            lonDeg: u.lonDeg,
            validAtUtc: new Date(u.validAtUtc).toISOString(),
            profileId: profile.id,
          });
        });
        if (row) {
          stored++;
          emitted.push({
            profileId: row.profileId,
            region: row.region,
            validAtUtc: row.validAtUtc,
          });
        } else {
          skipped++;
        }
      } catch (err) {
        // An invalid update cannot be stored; later ones still are (logged, not retried forever).
        skipped++;
        this.logger.warn(
          `feed update ${u.seq} (${u.region}) not stored: ${(err as Error).message}`,
        );
      }
    }
    for (const e of emitted) this.events.emit({ type: 'feed-update', ...e });
    if (stored) this.logger.log(`stored ${stored} feed update(s)`);
    return {
      feedId: response.feedId,
      stored,
      skipped,
      lastSeq: this.repo.lastSeq(response.feedId),
    };
  }

  private async fetchUpdates(baseUrl: string, since: number): Promise<FeedResponse> {
    let json: unknown;
    try {
      const res = await fetch(`${baseUrl}/updates?since=${since}`, {
        signal: AbortSignal.timeout(FETCH_TIMEOUT_MS),
      });
      if (!res.ok) throw new Error(`HTTP ${res.status}`);
      json = await res.json();
    } catch (err) {
      this.logger.warn(`conditions feed unreachable (${(err as Error).message}); will retry`);
      throw new ApiException(503, 'The conditions feed is unreachable; the next poll will retry');
    }
    const parsed = feedResponseSchema.safeParse(json);
    if (!parsed.success) {
      throw new ApiException(503, 'The conditions feed answered in an unexpected format');
    }
    return parsed.data;
  }

  /** The latest feed profile of a region, or of the region nearest a point. */
  latestFeedProfile(where: string | GeoPoint): LatestFeedProfile | undefined {
    const all = this.repo.latestPerRegion().map(({ update, profile }) => ({
      profileId: profile.id,
      region: update.region,
      latDeg: update.latDeg,
      lonDeg: update.lonDeg,
      validAtUtc: update.validAtUtc,
      profile: profile.profile,
    }));
    if (typeof where === 'string') return all.find((r) => r.region === where);
    let best: LatestFeedProfile | undefined;
    for (const r of all) {
      const distanceKm = pathGeometry(where, r).distanceKm;
      if (!best || distanceKm < (best.distanceKm as number)) best = { ...r, distanceKm };
    }
    return best;
  }

  /** The built-in diurnal model (SPEC §4) at a point and time — approximate. */
  model(point: GeoPoint, at: Date): DiurnalModelResult {
    return diurnalModel(point, at);
  }
}
