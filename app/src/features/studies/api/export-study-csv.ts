import { api } from '@/lib/api-client';

/**
 * Downloads a saved study as CSV. The export route needs the bearer token, so the file is fetched
 * through the API client as a Blob and handed to the browser from an object URL.
 */
export async function exportStudyCsv(id: number): Promise<void> {
  const blob = await api.get<Blob>(`/api/studies/${id}/export.csv`, { responseType: 'blob' });
  const url = URL.createObjectURL(blob);
  try {
    const anchor = document.createElement('a');
    anchor.href = url;
    anchor.download = `hopwise-study-${id}.csv`;
    document.body.append(anchor);
    anchor.click();
    anchor.remove();
  } finally {
    // Give the browser a moment to start the download before the URL goes away.
    window.setTimeout(() => URL.revokeObjectURL(url), 10_000);
  }
}
