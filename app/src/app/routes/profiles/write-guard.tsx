import { hasPermission } from '@hopwise/common';
import type { ReactNode } from 'react';
import { NotAvailable } from '@/components/errors/not-available';
import { useUser } from '@/features/auth/api/get-user';
import { roleLabel } from '@/utils/role-labels';

/** Pages that add to the library need `profiles:write` (the server checks the same). */
export function ProfilesWriteGuard({ tool, children }: { tool: string; children: ReactNode }) {
  const { data: user } = useUser();
  if (!user) return null;
  if (!hasPermission(user.role, 'profiles:write')) {
    return <NotAvailable area={tool} roleName={roleLabel(user.role)} />;
  }
  return <>{children}</>;
}
