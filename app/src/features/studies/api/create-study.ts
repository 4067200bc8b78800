import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { Study, StudyInput } from '@/types/links';
import { getStudyQueryOptions } from './get-study';
import { studiesQueryKey } from './get-studies';

export const createStudy = (input: StudyInput) => api.post<Study>('/api/studies', input);

export function useCreateStudy({ onSuccess }: { onSuccess?: (study: Study) => void } = {}) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createStudy,
    onSuccess: async (study) => {
      queryClient.setQueryData(getStudyQueryOptions(study.id).queryKey, study);
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: [...studiesQueryKey, 'list'] }),
        // The dashboard's "latest study" cards live under the links key.
        queryClient.invalidateQueries({ queryKey: ['links', 'latest-study'] }),
      ]);
      onSuccess?.(study);
    },
  });
}
