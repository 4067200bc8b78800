import {
  Badge,
  Body1,
  Button,
  Caption1,
  Select,
  Table,
  TableBody,
  TableCell,
  TableCellLayout,
  TableHeader,
  TableHeaderCell,
  TableRow,
  makeStyles,
} from '@fluentui/react-components';
import { ROLES, isRole, type ListResponse, type UserView } from '@hopwise/common';
import { useTableStyles } from '@/components/data-table/table-styles';
import { TimeCell } from '@/components/data-table/time-cell';
import { EmptyState } from '@/components/empty-state';
import { QueryStateBoundary } from '@/components/query-state-boundary';
import { useNotify } from '@/hooks/use-notify';
import { roleLabel } from '@/utils/role-labels';
import { useUsers } from '../api/get-users';
import { useUpdateUser, type UpdateUserInput } from '../api/update-user';

const useStyles = makeStyles({
  table: { minWidth: '820px' },
  roleColumn: { width: '190px' },
  statusColumn: { width: '110px' },
  createdColumn: { width: '230px' },
  accessColumn: { width: '110px' },
  select: { width: '170px' },
});

function describeChange(input: UpdateUserInput, email: string): string {
  if ('role' in input.change) return `${email} is now ${roleLabel(input.change.role)}.`;
  return input.change.disabled ? `${email} can no longer sign in.` : `${email} can sign in again.`;
}

export function UsersTable({ currentUserId }: { currentUserId: number }) {
  const styles = useStyles();
  const table = useTableStyles();
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

  const busyId = update.isPending ? update.variables?.id : undefined;

  const list = ({ items, total }: ListResponse<UserView>) => (
    <>
      <div className={table.wrapper}>
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
              const isSelf = user.id === currentUserId;
              const busy = busyId === user.id;
              return (
                <TableRow key={user.id}>
                  <TableCell>
                    <TableCellLayout
                      description={<Caption1 className={table.muted}>{user.email}</Caption1>}
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
                    <TimeCell iso={user.createdAt} />
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
      <Caption1 as="p" className={table.total}>
        {total === items.length
          ? `${total} ${total === 1 ? 'user' : 'users'}`
          : `Showing ${items.length} of ${total} users`}
      </Caption1>
    </>
  );

  return (
    <QueryStateBoundary
      query={users}
      loadingLabel="Loading users…"
      errorTitle="Could not load users"
      padSpinner
      empty={<EmptyState title="No users yet">Add the first account with “Add user”.</EmptyState>}
      isEmpty={(data) => data.items.length === 0}
    >
      {list}
    </QueryStateBoundary>
  );
}
