import {
  Badge,
  Body1,
  Button,
  Caption1,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  Select,
  Spinner,
  Table,
  TableBody,
  TableCell,
  TableCellLayout,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { ROLES, isRole, type UserView } from '@hopwise/common';
import { EmptyState } from '@/components/empty-state';
import { useNotify } from '@/hooks/use-notify';
import { formatUtcAndLocal } from '@/utils/format-time';
import { roleLabel } from '@/utils/role-labels';
import { useUsers } from '../api/get-users';
import { useUpdateUser, type UpdateUserInput } from '../api/update-user';

const useStyles = makeStyles({
  wrapper: {
    overflowX: 'auto',
    backgroundColor: tokens.colorNeutralBackground1,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
  },
  table: { minWidth: '820px' },
  roleColumn: { width: '190px' },
  statusColumn: { width: '110px' },
  createdColumn: { width: '230px' },
  accessColumn: { width: '110px' },
  muted: { color: tokens.colorNeutralForeground3 },
  stack: { display: 'flex', flexDirection: 'column' },
  select: { width: '170px' },
  loading: { padding: tokens.spacingVerticalXXL },
  total: { marginTop: tokens.spacingVerticalS, color: tokens.colorNeutralForeground3 },
});

function describeChange(input: UpdateUserInput, email: string): string {
  if ('role' in input.change) return `${email} is now ${roleLabel(input.change.role)}.`;
  return input.change.disabled ? `${email} can no longer sign in.` : `${email} can sign in again.`;
}

export function UsersTable({ currentUserId }: { currentUserId: number }) {
  const styles = useStyles();
  const notify = useNotify();
  const users = useUsers();

  const emailOf = (id: number) => users.data?.items.find((u) => u.id === id)?.email ?? `User ${id}`;
  const update = useUpdateUser({
    onSuccess: (_user, input) =>
      notify(
        'success',
        'role' in input.change
          ? 'Role changed'
          : input.change.disabled
            ? 'User disabled'
            : 'User enabled',
        describeChange(input, emailOf(input.id)),
      ),
    onError: (error, input) =>
      notify('error', `Could not update ${emailOf(input.id)}`, error.message),
  });

  if (users.isPending) {
    return <Spinner className={styles.loading} label="Loading users…" />;
  }

  if (users.isError) {
    return (
      <MessageBar intent="error" layout="multiline" role="alert">
        <MessageBarBody>
          <MessageBarTitle>Could not load users</MessageBarTitle>
          {users.error.message}
        </MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => void users.refetch()}>Try again</Button>
        </MessageBarActions>
      </MessageBar>
    );
  }

  const { items, total } = users.data;
  if (items.length === 0) {
    return <EmptyState title="No users yet">Add the first account with “Add user”.</EmptyState>;
  }

  const busyId = update.isPending ? update.variables?.id : undefined;

  return (
    <>
      <div className={styles.wrapper}>
        <Table className={styles.table} aria-label="Users">
          <TableHeader>
            <TableRow>
              <TableHeaderCell>Name</TableHeaderCell>
              <TableHeaderCell className={styles.roleColumn}>Role</TableHeaderCell>
              <TableHeaderCell className={styles.statusColumn}>Status</TableHeaderCell>
              <TableHeaderCell className={styles.createdColumn}>Created</TableHeaderCell>
              <TableHeaderCell className={styles.accessColumn}>Access</TableHeaderCell>
            </TableRow>
          </TableHeader>
          <TableBody>
            {items.map((user: UserView) => {
              const created = formatUtcAndLocal(user.createdAt);
              const isSelf = user.id === currentUserId;
              const busy = busyId === user.id;
              return (
                <TableRow key={user.id}>
                  <TableCell>
                    <TableCellLayout
                      description={<Caption1 className={styles.muted}>{user.email}</Caption1>}
                    >
                      <Body1>
                        {user.displayName}
                        {isSelf && ' (you)'}
                      </Body1>
                    </TableCellLayout>
                  </TableCell>
                  <TableCell>
                    <Select
                      className={styles.select}
                      aria-label={`Role of ${user.email}`}
                      value={user.role}
                      disabled={busy || isSelf}
                      onChange={(_, data) => {
                        if (isRole(data.value) && data.value !== user.role) {
                          update.mutate({ id: user.id, change: { role: data.value } });
                        }
                      }}
                    >
                      {ROLES.map((role) => (
                        <option key={role} value={role}>
                          {roleLabel(role)}
                        </option>
                      ))}
                    </Select>
                  </TableCell>
                  <TableCell>
                    {user.disabled ? (
                      <Badge appearance="tint" color="danger">
                        Disabled
                      </Badge>
                    ) : (
                      <Badge appearance="tint" color="success">
                        Active
                      </Badge>
                    )}
                  </TableCell>
                  <TableCell>
                    <div className={styles.stack}>
                      <Body1>{created.utc}</Body1>
                      <Caption1 className={styles.muted}>{created.localShort} local</Caption1>
                    </div>
                  </TableCell>
                  <TableCell>
                    <Button
                      size="small"
                      disabled={busy || isSelf}
                      aria-label={`${user.disabled ? 'Enable' : 'Disable'} ${user.email}`}
                      onClick={() =>
                        update.mutate({ id: user.id, change: { disabled: !user.disabled } })
                      }
                    >
                      {user.disabled ? 'Enable' : 'Disable'}
                    </Button>
                  </TableCell>
                </TableRow>
              );
            })}
          </TableBody>
        </Table>
      </div>
      <Caption1 as="p" className={styles.total}>
        {total === items.length
          ? `${total} ${total === 1 ? 'user' : 'users'}`
          : `Showing ${items.length} of ${total} users`}
      </Caption1>
    </>
  );
}
