import ical from 'ical-generator';
import Papa from 'papaparse';
import type { ScheduleRow } from '../db/schema/nets.js';

const CAUTION =
  'Predictions are estimates: keep an alternative for safety-of-life traffic. Transmit only on ' +
  'channels your licence or assignment allows; RF-exposure limits of local regulations apply.';

const endOf = (startUtc: string, slotMinutes: number) =>
  new Date(Date.parse(startUtc) + slotMinutes * 60_000).toISOString();

/** CSV of a published version: one row per slot (times UTC, channels kHz, MUF MHz). */
export function scheduleCsv(netName: string, s: ScheduleRow): string {
  const rows = s.slots.map((slot) => ({
    net: netName,
    version: s.version,
    startUtc: slot.startUtc,
    endUtc: endOf(slot.startUtc, s.slotMinutes),
    channelKHz: slot.channelKHz ?? '',
    bestChannelKHz: slot.bestChannelKHz ?? '',
    overridden: slot.overridden,
    usableChannelsKHz: slot.usableChannelsKHz.join(' '),
    lowestMufMHz: slot.mufMHz === null ? '' : slot.mufMHz.toFixed(2),
  }));
  return Papa.unparse(rows, { newline: '\r\n' }) + '\r\n';
}

/**
 * iCalendar (RFC 5545, built with ical-generator) of a published version: one event per run of
 * consecutive slots on the same channel, i.e. an event at each channel change.
 */
export function scheduleIcs(netId: number, netName: string, s: ScheduleRow): string {
  const cal = ical({
    name: `${netName} — schedule v${s.version}`,
    prodId: { company: 'Hopwise', product: 'net-schedule', language: 'EN' },
  });
  let i = 0;
  while (i < s.slots.length) {
    let j = i;
    while (j + 1 < s.slots.length && s.slots[j + 1].channelKHz === s.slots[i].channelKHz) j++;
    const channel = s.slots[i].channelKHz;
    cal.createEvent({
      id: `hopwise-net-${netId}-v${s.version}-${s.slots[i].startUtc}`,
      start: new Date(s.slots[i].startUtc),
      end: new Date(endOf(s.slots[j].startUtc, s.slotMinutes)),
      summary: channel === null ? `${netName}: no usable channel` : `${netName}: ${channel} kHz`,
      description: `Published schedule version ${s.version}. ${CAUTION}`,
    });
    i = j + 1;
  }
  return cal.toString();
}
