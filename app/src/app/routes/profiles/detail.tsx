import { hasPermission } from '@hopwise/common';
import { useParams } from 'react-router-dom';
import { useUser } from '@/features/auth/api/get-user';
import { ProfileDetail } from '@/features/profiles/components/profile-detail';
import { ProfilesNav } from '@/features/profiles/components/profiles-nav';
import NotFoundRoute from '../not-found';

export default function ProfileDetailRoute() {
  const { profileId } = useParams();
  const { data: user } = useUser();
  const id = Number(profileId);
  if (!user) return null;
  if (!Number.isInteger(id) || id <= 0) return <NotFoundRoute />;
  return (
    <ProfileDetail
      key={id}
      nav={<ProfilesNav canWrite={hasPermission(user.role, 'profiles:write')} />}
      id={id}
      currentUserId={user.id}
      canPublish={hasPermission(user.role, 'profiles:publish')}
      isAdmin={user.role === 'admin'}
    />
  );
}
