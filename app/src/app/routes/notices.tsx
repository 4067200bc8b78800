import { Caption1, makeStyles, tokens } from '@fluentui/react-components';
import { PageHeader } from '@/components/page-header';
import { NoticesInbox } from '@/features/notices/components/notices-inbox';
import { PushOptIn } from '@/features/notices/components/push-opt-in';

const useStyles = makeStyles({
  caution: {
    display: 'block',
    marginTop: tokens.spacingVerticalL,
    color: tokens.colorNeutralForeground3,
  },
});

export default function NoticesRoute() {
  const styles = useStyles();
  return (
    <>
      <PageHeader
        title="Notices"
        description="What the watch noticed on the nets you belong to and the links you follow, newest first."
      />
      <PushOptIn />
      <NoticesInbox />
      <Caption1 className={styles.caution}>
        Notices come from predictions, which are estimates: keep an alternative path for
        safety-of-life traffic, transmit only on channels your licence or assignment allows, and
        observe local RF-exposure limits.
      </Caption1>
    </>
  );
}
