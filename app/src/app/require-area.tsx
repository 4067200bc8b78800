import type { NavAreaKey } from '@hopwise/common';
import { NAV_AREAS } from '@hopwise/common';
import type { ReactNode } from 'react';
import { NotAvailable } from '@/components/errors/not-available';
import { useUser } from '@/features/auth/api/get-user';
import { canUseArea } from '@/utils/nav-items';
import { roleLabel } from '@/utils/role-labels';

/**
 * The route guard: an area the signed-in role may not use shows a "not available" page. The
 * server enforces the same table; this only keeps people from walking into 403s.
 */
export function RequireArea({ area, children }: { area: NavAreaKey; children: ReactNode }) {
  const { data: user } = useUser();
  if (!user) return null; // the app root redirects to sign-in
  if (!canUseArea(user.role, area)) {
    const label = NAV_AREAS.find((a) => a.key === area)?.label ?? area;
    return <NotAvailable area={label} roleName={roleLabel(user.role)} />;
  }
  return <>{children}</>;
}
