import { Map24Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export default function MapRoute() {
  return (
    <>
      <PageHeader
        title="Map"
        description="Your stations and the great-circle paths of your links on a world map."
      />
      <EmptyState icon={<Map24Regular />} title="The map is not available yet">
        When stations and links can be entered, they will be drawn here on a basemap shipped with
        Hopwise (no tile server needed), with each link's path midpoint, the control point used by
        the built-in model.
      </EmptyState>
    </>
  );
}
