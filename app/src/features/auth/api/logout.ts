import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import { clearToken } from '@/lib/auth-token';

/**
 * Sign out: the API issues stateless bearer tokens, so signing out forgets the token and every
 * cached answer on this device.
 */
export function useLogout(): () => void {
  const queryClient = useQueryClient();
  return useCallback(() => {
    clearToken();
    queryClient.clear();
  }, [queryClient]);
}
