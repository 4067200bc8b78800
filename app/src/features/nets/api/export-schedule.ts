import { api } from '@/lib/api-client';

/**
 * Downloads the latest published version as CSV or iCalendar. The routes need the bearer token,
 * so the file is fetched through the API client and handed to the browser from an object URL.
 */
export async function exportSchedule(netId: number, format: 'csv' | 'ics'): Promise<void> {
  const blob = await api.get<Blob>(`/api/nets/${netId}/schedule.${format}`, {
    responseType: 'blob',
  });
  const url = URL.createObjectURL(blob);
  try {
    const anchor = document.createElement('a');
    anchor.href = url;
    anchor.download = `hopwise-net-${netId}-schedule.${format}`;
    document.body.append(anchor);
    anchor.click();
    anchor.remove();
  } finally {
    window.setTimeout(() => URL.revokeObjectURL(url), 10_000);
  }
}
