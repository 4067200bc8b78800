import { Body1, Card, CardHeader, Subtitle1, makeStyles, tokens } from '@fluentui/react-components';
import { Info24Regular } from '@fluentui/react-icons';

const useStyles = makeStyles({
  card: {
    padding: tokens.spacingHorizontalXL,
    gap: tokens.spacingVerticalM,
    borderLeft: `4px solid ${tokens.colorPaletteMarigoldBorderActive}`,
  },
  icon: { color: tokens.colorPaletteMarigoldForeground2, fontSize: '24px' },
  list: {
    margin: 0,
    paddingLeft: tokens.spacingHorizontalXL,
    lineHeight: tokens.lineHeightBase400,
  },
});

/** The safety notes of SPEC §6, shown where predictions are used. */
export function SafetyNotes() {
  const styles = useStyles();
  return (
    <Card className={styles.card} aria-labelledby="safety-title">
      <CardHeader
        image={<Info24Regular className={styles.icon} aria-hidden />}
        header={
          <Subtitle1 as="h2" id="safety-title">
            Before you transmit
          </Subtitle1>
        }
      />
      <ul className={styles.list}>
        <li>
          <Body1>
            <strong>Predictions are estimates.</strong> The ionosphere changes from hour to hour;
            keep an alternative path for safety-of-life traffic.
          </Body1>
        </li>
        <li>
          <Body1>
            Transmit only on channels your licence or assignment allows, whatever a schedule
            suggests.
          </Body1>
        </li>
        <li>
          <Body1>The RF-exposure limits of your local regulations apply to every station.</Body1>
        </li>
      </ul>
    </Card>
  );
}
