import { hasPermission } from '@hopwise/common';
import { PageHeader } from '@/components/page-header';
import { useUser } from '@/features/auth/api/get-user';
import { CompareView } from '@/features/profiles/components/compare-view';
import { ProfilesNav } from '@/features/profiles/components/profiles-nav';

export default function CompareProfilesRoute() {
  const { data: user } = useUser();
  if (!user) return null;
  return (
    <>
      <PageHeader
        title="Compare profiles"
        description="Peaks, thickness, TEC, synthetic ionograms and delays on reference paths, side by side."
      />
      <ProfilesNav canWrite={hasPermission(user.role, 'profiles:write')} />
      <CompareView />
    </>
  );
}
