import { DateTime } from 'luxon';

export interface UtcAndLocal {
  /** e.g. "2025-03-14 09:05 UTC" */
  utc: string;
  /** e.g. "2025-03-14 10:05 UTC+01:00", in the given zone (default: the browser's) */
  local: string;
  /** local time without the date when it falls on the same calendar day as in UTC: "10:05 UTC+01:00" */
  localShort: string;
  /** both, for a single line: "2025-03-14 09:05 UTC (10:05 UTC+01:00 local)" */
  text: string;
}

const INVALID: UtcAndLocal = { utc: '—', local: '—', localShort: '—', text: 'unknown time' };

/**
 * An ISO 8601 instant shown in UTC and in local time. The API speaks UTC (SPEC §3); people read
 * both. `zone` is an IANA zone name; tests pass one so the result does not depend on the machine.
 */
export function formatUtcAndLocal(iso: string | null | undefined, zone?: string): UtcAndLocal {
  if (!iso) return INVALID;
  const instant = DateTime.fromISO(iso, { zone: 'utc' });
  if (!instant.isValid) return INVALID;
  const local = zone ? instant.setZone(zone) : instant.toLocal();
  if (!local.isValid) return INVALID;

  const utc = `${instant.toFormat('yyyy-MM-dd HH:mm')} UTC`;
  const sameDay = local.toISODate() === instant.toISODate();
  // The numeric offset reads the same in every locale, unlike zone abbreviations.
  const offset = local.offset === 0 ? 'UTC' : `UTC${local.toFormat('ZZ')}`;
  const localShort = `${local.toFormat(sameDay ? 'HH:mm' : 'yyyy-MM-dd HH:mm')} ${offset}`;
  return {
    utc,
    local: `${local.toFormat('yyyy-MM-dd HH:mm')} ${offset}`,
    localShort,
    text: `${utc} (${localShort} local)`,
  };
}
