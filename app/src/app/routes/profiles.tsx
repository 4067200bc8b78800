import { DataArea24Regular } from '@fluentui/react-icons';
import { EmptyState } from '@/components/empty-state';
import { PageHeader } from '@/components/page-header';

export default function ProfilesRoute() {
  return (
    <>
      <PageHeader
        title="Profiles"
        description="The library of electron-density profiles that predictions are computed from."
      />
      <EmptyState icon={<DataArea24Regular />} title="The profile library is not available yet">
        Profiles built from layer parameters, uploaded as samples, or inverted from sounding traces
        will be listed here with their foF2, hmF2 and vertical TEC, together with N(h) and
        synthetic-ionogram charts and a side-by-side comparison.
      </EmptyState>
    </>
  );
}
