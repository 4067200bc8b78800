/** Notices: what the watch tells a user when the band moves under a net or a followed link. */
export const NOTICE_KIND_VALUES = [
  'above-muf',
  'best-channel-changed',
  'mode-appeared',
  'mode-disappeared',
] as const;
export type NoticeKindValue = (typeof NOTICE_KIND_VALUES)[number];

export interface NoticeView {
  id: number;
  kind: NoticeKindValue;
  subjectType: 'net' | 'link';
  subjectId: number;
  title: string;
  body: string;
  /** Where the client shows the subject (path inside the app). */
  url: string;
  data: Record<string, unknown>;
  createdAt: string;
  readAt: string | null;
}

export interface NoticeListResponse {
  items: NoticeView[];
  total: number;
  unread: number;
}

export interface LinkFollowView {
  linkId: number;
  following: boolean;
  /** Channels planned for the link; empty = the watch judges the best channel of its own plan. */
  channelsKHz: number[];
  /** The channel the user works on, watched for rising above the MUF. */
  watchChannelKHz: number | null;
  createdAt: string | null;
}

/** Web Push payload (JSON, encrypted aes128gcm by the sender). */
export interface PushPayload {
  title: string;
  body: string;
  url: string;
}
