import type { Env } from '../config/app-config.js';

/**
 * Conditions-feed settings, read with the rest of the configuration (config/app-config.ts):
 *   HOPWISE_FEED_URL       base URL of the feed (unset: use the in-process stand-in)
 *   HOPWISE_FEED_STANDIN   '0' to not start the stand-in when HOPWISE_FEED_URL is unset (default on)
 *   HOPWISE_FEED_POLL_MS   poll interval [ms], default 60000; 0 = only on demand (POST /api/conditions/poll)
 */
export interface FeedConfig {
  feedUrl: string | undefined;
  standIn: boolean;
  pollMs: number;
}

export const FEED_CONFIG = Symbol('FEED_CONFIG');
const DEFAULT_POLL_MS = 60_000;

/** Reads the feed settings; adds what is wrong to `problems` (the caller reports them all). */
export function loadFeedConfig(env: Env, problems: string[]): FeedConfig {
  const feedUrl = env.HOPWISE_FEED_URL?.trim() || undefined;
  if (feedUrl && !/^https?:\/\/[^\s]+$/.test(feedUrl)) {
    problems.push(`HOPWISE_FEED_URL must be an http(s) URL (got "${feedUrl}")`);
  }
  const standInRaw = env.HOPWISE_FEED_STANDIN?.trim() ?? '1';
  if (!['0', '1', ''].includes(standInRaw)) {
    problems.push(`HOPWISE_FEED_STANDIN must be 0 or 1 (got "${standInRaw}")`);
  }
  const pollRaw = env.HOPWISE_FEED_POLL_MS?.trim() || String(DEFAULT_POLL_MS);
  const pollMs = Number(pollRaw);
  if (!/^\d+$/.test(pollRaw) || (pollMs !== 0 && (pollMs < 1000 || pollMs > 86_400_000))) {
    problems.push(
      `HOPWISE_FEED_POLL_MS must be 0 or an integer from 1000 to 86400000 (got "${pollRaw}")`,
    );
  }
  return { feedUrl, standIn: standInRaw !== '0', pollMs };
}
