import type { NoticeView } from '@hopwise/common';
import type { NoticeRow } from '../db/schema.js';

/** Where the client shows a notice's subject. */
export function noticeUrl(row: Pick<NoticeRow, 'subjectType' | 'subjectId'>): string {
  return row.subjectType === 'net' ? `/nets?net=${row.subjectId}` : `/links/${row.subjectId}/study`;
}

export function toNoticeView(row: NoticeRow): NoticeView {
  return {
    id: row.id,
    kind: row.kind,
    subjectType: row.subjectType,
    subjectId: row.subjectId,
    title: row.title,
    body: row.body,
    url: noticeUrl(row),
    data: row.data,
    createdAt: row.createdAt,
    readAt: row.readAt,
  };
}

/** Plain-text e-mail body, with the safety reminder owed wherever a user acts on a prediction. */
export function noticeMailText(row: Pick<NoticeRow, 'title' | 'body'>, url: string): string {
  return [
    row.title,
    '',
    row.body,
    '',
    `Open in Hopwise: ${url}`,
    '',
    'Predictions are estimates: keep an alternative path for safety-of-life traffic, transmit only',
    'on channels your licence or assignment allows, and observe local RF-exposure limits.',
  ].join('\n');
}
