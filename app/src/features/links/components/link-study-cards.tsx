import {
  Caption1,
  MessageBar,
  MessageBarBody,
  Spinner,
  Subtitle1,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { EmptyState } from '@/components/empty-state';
import { LinkButton } from '@/components/link-button';
import { paths } from '@/config/paths';
import { useLinks } from '../api/get-links';
import { LinkStudyCard } from './link-study-card';

const useStyles = makeStyles({
  section: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalM,
    marginTop: tokens.spacingVerticalXXL,
  },
  head: {
    display: 'flex',
    flexWrap: 'wrap',
    justifyContent: 'space-between',
    alignItems: 'end',
    gap: tokens.spacingHorizontalM,
  },
  grid: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(min(300px, 100%), 1fr))',
    gap: tokens.spacingHorizontalL,
  },
  muted: { color: tokens.colorNeutralForeground3 },
});

/** Cards shown on the dashboard (the first few). */
const CARD_LIMIT = 6;

/** The dashboard section "Your links": one card per link with its latest study. */
export function LinkStudyCards() {
  const styles = useStyles();
  const links = useLinks();

  let body;
  if (links.isPending) body = <Spinner size="small" label="Loading your links…" />;
  else if (links.isError) {
    body = (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>Could not load your links: {links.error.message}</MessageBarBody>
      </MessageBar>
    );
  } else if (links.data.items.length === 0) {
    body = (
      <EmptyState
        title="No links yet"
        action={
          <LinkButton to={paths.links.getHref()} appearance="primary">
            Add stations and a link
          </LinkButton>
        }
      >
        A link joins two stations; a study tells you its modes, MUF and group delay.
      </EmptyState>
    );
  } else {
    const shown = links.data.items.slice(0, CARD_LIMIT);
    body = (
      <>
        <div className={styles.grid}>
          {shown.map((link) => (
            <LinkStudyCard key={link.id} link={link} />
          ))}
        </div>
        {links.data.total > shown.length && (
          <Caption1 className={styles.muted}>
            Showing {shown.length} of {links.data.total} links.
          </Caption1>
        )}
      </>
    );
  }

  return (
    <section className={styles.section} aria-labelledby="your-links-title">
      <div className={styles.head}>
        <Subtitle1 as="h2" id="your-links-title">
          Your links
        </Subtitle1>
        <LinkButton to={paths.links.getHref()} appearance="subtle">
          All links
        </LinkButton>
      </div>
      {body}
    </section>
  );
}
