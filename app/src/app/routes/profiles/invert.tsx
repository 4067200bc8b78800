import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { InversionView } from '@/features/profiles/components/inversion-view';
import { ProfilesNav } from '@/features/profiles/components/profiles-nav';
import { ProfilesWriteGuard } from './write-guard';

export default function InvertTraceRoute() {
  const [searchParams] = useSearchParams();
  const id = Number(searchParams.get('sounding'));
  return (
    <ProfilesWriteGuard tool="Inverting traces">
      <PageHeader
        title="Invert a sounding trace"
        description="From virtual heights to a true-height profile, checked by laying the profile's synthetic ionogram over the trace."
      />
      <ProfilesNav canWrite />
      <InversionView
        key={Number.isInteger(id) && id > 0 ? id : 'latest'}
        initialSoundingId={Number.isInteger(id) && id > 0 ? id : undefined}
      />
    </ProfilesWriteGuard>
  );
}
