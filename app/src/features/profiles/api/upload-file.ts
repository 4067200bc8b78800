import { useMutation, useQueryClient } from '@tanstack/react-query';
import { isApiError } from '@/lib/api-client';
import { uploadForm, type UploadProgress } from '@/lib/upload';
import { profilesQueryKey } from './get-profiles';
import { soundingsQueryKey } from './get-soundings';
import type { ProfileRow, SoundingRow, UploadRowError } from './types';

export type UploadKind = 'samples' | 'trace';

export interface UploadInput {
  kind: UploadKind;
  file: File;
  name: string;
  /** ISO 8601 UTC; sent as validAtUtc (samples) or observedAtUtc (trace). */
  timeUtc?: string;
  latDeg?: number;
  lonDeg?: number;
}

export type UploadResult =
  { kind: 'samples'; row: ProfileRow } | { kind: 'trace'; row: SoundingRow };

export async function uploadFile(
  input: UploadInput,
  onProgress?: (progress: UploadProgress) => void,
): Promise<UploadResult> {
  const form = new FormData();
  form.append('name', input.name);
  if (input.timeUtc)
    form.append(input.kind === 'trace' ? 'observedAtUtc' : 'validAtUtc', input.timeUtc);
  if (input.latDeg !== undefined) form.append('latDeg', String(input.latDeg));
  if (input.lonDeg !== undefined) form.append('lonDeg', String(input.lonDeg));
  // The file goes last so that servers streaming the body see the metadata first.
  form.append('file', input.file, input.file.name);
  if (input.kind === 'trace') {
    const row = await uploadForm<SoundingRow>('/api/soundings/upload', form, { onProgress });
    return { kind: 'trace', row };
  }
  const row = await uploadForm<ProfileRow>('/api/profiles/upload', form, { onProgress });
  return { kind: 'samples', row };
}

/** The refused rows of a 400 upload answer, or [] when the error is not about rows. */
export function uploadRowErrors(error: unknown): UploadRowError[] {
  if (!isApiError(error) || error.status !== 400) return [];
  const body = error.body as { rows?: unknown } | undefined;
  return Array.isArray(body?.rows) ? (body.rows as UploadRowError[]) : [];
}

export function useUploadFile({
  onProgress,
  onSuccess,
}: {
  onProgress?: (progress: UploadProgress) => void;
  onSuccess?: (result: UploadResult) => void;
} = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UploadInput) => uploadFile(input, onProgress),
    onSuccess: async (result) => {
      await queryClient.invalidateQueries({
        queryKey: result.kind === 'trace' ? soundingsQueryKey : profilesQueryKey,
      });
      onSuccess?.(result);
    },
  });
}
