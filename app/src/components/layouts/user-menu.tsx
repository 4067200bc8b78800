import {
  Avatar,
  Button,
  Caption1,
  Menu,
  MenuDivider,
  MenuGroup,
  MenuGroupHeader,
  MenuItem,
  MenuList,
  MenuPopover,
  MenuTrigger,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { SignOut24Regular } from '@fluentui/react-icons';
import { roleLabel } from '@/utils/role-labels';

const useStyles = makeStyles({
  trigger: { maxWidth: '260px' },
  name: { overflow: 'hidden', textOverflow: 'ellipsis', whiteSpace: 'nowrap' },
  details: {
    display: 'flex',
    flexDirection: 'column',
    padding: `0 ${tokens.spacingHorizontalS} ${tokens.spacingVerticalS}`,
    color: tokens.colorNeutralForeground2,
  },
});

export interface ShellUser {
  displayName: string;
  email: string;
  role: string;
}

export function UserMenu({ user, onSignOut }: { user: ShellUser; onSignOut: () => void }) {
  const styles = useStyles();
  const roleName = roleLabel(user.role);
  return (
    <Menu positioning="below-end">
      <MenuTrigger disableButtonEnhancement>
        <Button
          appearance="subtle"
          className={styles.trigger}
          icon={<Avatar name={user.displayName} size={28} color="colorful" aria-hidden />}
          aria-label={`Account: ${user.displayName}, ${roleName}`}
        >
          <span className={styles.name}>{user.displayName}</span>
        </Button>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          <MenuGroup>
            <MenuGroupHeader>{user.displayName}</MenuGroupHeader>
            <div className={styles.details}>
              <Caption1>{user.email}</Caption1>
              <Caption1>Role: {roleName}</Caption1>
            </div>
          </MenuGroup>
          <MenuDivider />
          <MenuItem icon={<SignOut24Regular />} onClick={onSignOut}>
            Sign out
          </MenuItem>
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
