import { Spinner, makeStyles } from '@fluentui/react-components';

const useStyles = makeStyles({
  root: { minHeight: '100vh', display: 'grid', placeItems: 'center' },
});

export function FullPageSpinner({ label }: { label: string }) {
  const styles = useStyles();
  return (
    <div className={styles.root}>
      <Spinner label={label} />
    </div>
  );
}
