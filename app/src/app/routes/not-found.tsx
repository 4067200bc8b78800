import { Search24Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/empty-state';
import { LinkButton } from '@/components/link-button';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';

export default function NotFoundRoute() {
  return (
    <>
      <PageHeader title="Page not found" />
      <EmptyState
        icon={<Search24Regular />}
        title="There is no page at this address"
        action={
          <LinkButton to={paths.dashboard.getHref()} appearance="primary">
            Go to the dashboard
          </LinkButton>
        }
      >
        The link may be mistyped or out of date.
      </EmptyState>
    </>
  );
}
