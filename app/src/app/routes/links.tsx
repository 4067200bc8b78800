import { PlugConnected24Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export default function LinksRoute() {
  return (
    <>
      <PageHeader title="Links" description="Stations, the links between them, and link studies." />
      <EmptyState icon={<PlugConnected24Regular />} title="No links to show yet">
        Stations and links will be listed here. For a link, a study will give the propagation modes
        (such as 1F2), the MUF and OWF, elevation angles, group delay, phase path and multipath
        spread for a chosen profile and time, and a 24-hour MUF chart.
      </EmptyState>
    </>
  );
}
