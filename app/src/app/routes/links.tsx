import { Subtitle1, makeStyles, tokens } from '@fluentui/react-components';
import { PageHeader } from '@/components/page-header';
import { useUser } from '@/features/auth/api/get-user';
import { LinksTable } from '@/features/links/components/links-table';
import { useStations } from '@/features/stations/api/get-stations';
import { StationsTable } from '@/features/stations/components/stations-table';

const useStyles = makeStyles({
  section: { display: 'flex', flexDirection: 'column', marginBottom: tokens.spacingVerticalXXXL },
  heading: { marginBottom: tokens.spacingVerticalM },
});

export default function LinksRoute() {
  const styles = useStyles();
  const { data: user } = useUser();
  const stations = useStations();
  if (!user) return null;
  const isAdmin = user.role === 'admin';
  return (
    <>
      <PageHeader
        title="Links"
        description="Your stations, the links between them, and a study of each link."
      />
      <section className={styles.section} aria-labelledby="links-heading">
        <Subtitle1 as="h2" id="links-heading" className={styles.heading}>
          Links
        </Subtitle1>
        <LinksTable
          stations={stations.data?.items ?? []}
          currentUserId={user.id}
          isAdmin={isAdmin}
        />
      </section>
      <section className={styles.section} aria-labelledby="stations-heading">
        <Subtitle1 as="h2" id="stations-heading" className={styles.heading}>
          Stations
        </Subtitle1>
        <StationsTable currentUserId={user.id} isAdmin={isAdmin} />
      </section>
    </>
  );
}
