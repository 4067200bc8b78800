import { LinkButton } from '@/components/link-button';
import { PageHeader } from '@/components/page-header';
import { paths } from '@/config/paths';
import { AuditTable } from '@/features/audit/components/audit-table';

export default function AdminAuditRoute() {
  return (
    <>
      <PageHeader
        title="Audit log"
        description="Every recorded change: user administration, publishing, and edits to shared data. Times in UTC, with your local time beside."
        actions={<LinkButton to={paths.adminUsers.getHref()}>Users</LinkButton>}
      />
      <AuditTable />
    </>
  );
}
