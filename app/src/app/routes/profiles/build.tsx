import { hasPermission } from '@hopwise/common';
import { PageHeader } from '@/components/page-header';
import { useUser } from '@/features/auth/api/get-user';
import { LayerBuilder } from '@/features/profiles/components/layer-builder';
import { ProfilesNav } from '@/features/profiles/components/profiles-nav';
import { ProfilesWriteGuard } from './write-guard';

export default function BuildProfileRoute() {
  const { data: user } = useUser();
  return (
    <ProfilesWriteGuard tool="Building profiles">
      <PageHeader
        title="Build a profile from layers"
        description="Set the E, F1 and F2 layers; the profile and its synthetic ionogram follow as you type."
      />
      <ProfilesNav canWrite />
      <LayerBuilder canPublish={!!user && hasPermission(user.role, 'profiles:publish')} />
    </ProfilesWriteGuard>
  );
}
