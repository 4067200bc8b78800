import { Add24Regular, ArrowUpload24Regular } from '@fluentui/react-icons';
import { hasPermission } from '@hopwise/common';
import { makeStyles, tokens } from '@fluentui/react-components';
import { LinkButton } from '@/components/link-button';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-user';
import { ProfileLibrary } from '@/features/profiles/components/profile-library';
import { ProfilesNav } from '@/features/profiles/components/profiles-nav';

const useStyles = makeStyles({
  actions: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS },
});

export default function ProfilesRoute() {
  const styles = useStyles();
  const { data: user } = useUser();
  if (!user) return null;
  const canWrite = hasPermission(user.role, 'profiles:write');
  return (
    <>
      <PageHeader
        title="Profiles"
        description="The library of electron-density profiles that predictions are computed from: yours and the published ones."
        actions={
          canWrite && (
            <div className={styles.actions}>
              <LinkButton to={paths.profileUpload.getHref()} icon={<ArrowUpload24Regular />}>
                Upload
              </LinkButton>
              <LinkButton
                to={paths.profileBuild.getHref()}
                appearance="primary"
                icon={<Add24Regular />}
              >
                Build from layers
              </LinkButton>
            </div>
          )
        }
      />
      <ProfilesNav canWrite={canWrite} />
      <ProfileLibrary
        currentUserId={user.id}
        canWrite={canWrite}
        canPublish={hasPermission(user.role, 'profiles:publish')}
        isAdmin={user.role === 'admin'}
      />
    </>
  );
}
