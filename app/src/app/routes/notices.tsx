import { Alert24Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export default function NoticesRoute() {
  return (
    <>
      <PageHeader
        title="Notices"
        description="Messages about changing band conditions on your links and nets."
      />
      <EmptyState icon={<Alert24Regular />} title="Your inbox is not available yet">
        Notices will arrive here when the channel in force on a subscribed link or published
        schedule rises above the MUF, the best channel changes, or a mode appears or disappears. You
        will also be able to receive them as push notifications or e-mail.
      </EmptyState>
    </>
  );
}
