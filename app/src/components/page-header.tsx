import { Body1, Title2, makeStyles, tokens } from '@fluentui/react-components';
import { useEffect, type ReactNode } from 'react';

const useStyles = makeStyles({
  header: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    justifyContent: 'space-between',
    gap: tokens.spacingHorizontalL,
    marginBottom: tokens.spacingVerticalXL,
  },
  text: {
    display: 'flex',
    flexDirection: 'column',
    gap: tokens.spacingVerticalXS,
    maxWidth: '70ch',
  },
  description: { color: tokens.colorNeutralForeground2 },
});

interface PageHeaderProps {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}

/** The one `h1` of a page; also sets the document title. */
export function PageHeader({ title, description, actions }: PageHeaderProps) {
  const styles = useStyles();
  useEffect(() => {
    document.title = `${title} · Hopwise`;
  }, [title]);
  return (
    <header className={styles.header}>
      <div className={styles.text}>
        <Title2 as="h1">{title}</Title2>
        {description && <Body1 className={styles.description}>{description}</Body1>}
      </div>
      {actions}
    </header>
  );
}
