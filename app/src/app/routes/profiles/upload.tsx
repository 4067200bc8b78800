import { PageHeader } from '@/components/page-header';
import { ProfilesNav } from '@/features/profiles/components/profiles-nav';
import { UploadPanel } from '@/features/profiles/components/upload-panel';
import { ProfilesWriteGuard } from './write-guard';

export default function UploadProfileRoute() {
  return (
    <ProfilesWriteGuard tool="Uploading profiles">
      <PageHeader
        title="Upload a trace or a profile"
        description="A sounding trace (virtual height by frequency) to invert, or profile samples (electron density or plasma frequency by height)."
      />
      <ProfilesNav canWrite />
      <UploadPanel />
    </ProfilesWriteGuard>
  );
}
