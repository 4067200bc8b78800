import type { NoticeKindValue } from '@hopwise/common';

/** Plain words for each kind of notice. */
export const NOTICE_KIND_LABELS: Readonly<Record<NoticeKindValue, string>> = {
  'above-muf': 'Above the MUF',
  'best-channel-changed': 'Best channel changed',
  'mode-appeared': 'Mode appeared',
  'mode-disappeared': 'Mode gone',
};
