import { LockClosed24Regular } from '@fluentui/react-icons';
import { paths } from '@/config/paths';
import { EmptyState } from '../empty-state';
import { LinkButton } from '../link-button';
import { PageHeader } from '../page-header';

/** Shown when the signed-in role may not use an area (the permission table in common/). */
export function NotAvailable({ area, roleName }: { area: string; roleName: string }) {
  return (
    <>
      <PageHeader title="Not available for your role" />
      <EmptyState
        icon={<LockClosed24Regular />}
        title={`${area} is not part of the ${roleName} role`}
        action={
          <LinkButton to={paths.dashboard.getHref()} appearance="primary">
            Go to the dashboard
          </LinkButton>
        }
      >
        Your account can use the areas listed in the navigation. If you need this one, ask an
        administrator to change your role.
      </EmptyState>
    </>
  );
}
