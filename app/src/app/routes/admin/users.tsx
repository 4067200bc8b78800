import { LinkButton } from '@/components/link-button';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { useUser } from '@/features/auth/api/get-user';
import { CreateUserDialog } from '@/features/users/components/create-user-dialog';
import { UsersTable } from '@/features/users/components/users-table';

export default function AdminUsersRoute() {
  const { data: user } = useUser();
  if (!user) return null;
  return (
    <>
      <PageHeader
        title="Users"
        description="Accounts of this installation: add people, change their role, or stop them from signing in. Your own account cannot be changed here."
        actions={
          <>
            <LinkButton to={paths.adminAudit.getHref()}>Audit log</LinkButton>
            <CreateUserDialog />
          </>
        }
      />
      <UsersTable currentUserId={user.id} />
    </>
  );
}
