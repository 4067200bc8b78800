/** Shapes of the nets routes (/api/nets), shared by the API and the client. Times ISO 8601 UTC. */

/** What a schedule was computed from (the plan's profileSource). */
export type NetProfileSource = 'model' | 'feed' | { profileId: number };

/** One slot of a published schedule (times ISO 8601 UTC; channels kHz; MUF MHz). */
export interface ScheduleSlot {
  startUtc: string;
  /** The channel in force: the override if any, else the best channel (null: none). */
  channelKHz: number | null;
  bestChannelKHz: number | null;
  usableChannelsKHz: number[];
  /** Lowest over the member paths of the highest MUF of each path (null: some path closed). */
  mufMHz: number | null;
  /** Lowest OWF over the member paths (0.85 × that path's highest MUF). */
  owfMHz: number | null;
  overridden: boolean;
}

export interface NetStationView {
  id: number;
  name: string;
  callSign: string | null;
  latDeg: number;
  lonDeg: number;
}

export interface NetView {
  id: number;
  ownerId: number;
  name: string;
  controlStationId: number;
  controlStation: NetStationView | null;
  memberStationIds: number[];
  memberStations: NetStationView[];
  channelsKHz: number[];
  /** Whether the asking user may edit, override and publish. */
  canManage: boolean;
  latestVersion: number | null;
  createdAt: string;
  updatedAt: string;
}

export interface ScheduleVersionView {
  netId: number;
  version: number;
  dateUtc: string;
  slotMinutes: number;
  publishedAt: string;
  publishedBy: number;
  profileSource: NetProfileSource;
  channelsKHz: number[];
  memberStationIds: number[];
  slots: ScheduleSlot[];
}

export interface NetScheduleView {
  netId: number;
  dateUtc: string;
  slotMinutes: number;
  profileSource: NetProfileSource;
  /** True when the built-in diurnal model was used (an approximate model). */
  approximate: boolean;
  channelsKHz: number[];
  /** Paths of the draft: control station → each member, great-circle range [km]. */
  paths: { memberStationId: number; distanceKm: number }[];
  /** Null for members who cannot manage the net (they see only published versions). */
  draft: { slots: ScheduleSlot[] } | null;
  published: ScheduleVersionView | null;
}
