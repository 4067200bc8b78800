import { CalendarLtr24Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export default function NetsRoute() {
  return (
    <>
      <PageHeader
        title="Nets"
        description="Nets of stations with assigned channels, and their frequency schedules."
      />
      <EmptyState icon={<CalendarLtr24Regular />} title="No nets to show yet">
        Nets you belong to and their published 24-hour schedules will appear here: the best usable
        channel for each slot, with times in UTC and your local time. Net controllers will create
        nets and publish schedules from this page.
      </EmptyState>
    </>
  );
}
