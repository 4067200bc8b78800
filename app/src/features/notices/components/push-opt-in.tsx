import {
  Body1,
  Button,
  Card,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Subtitle2,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { usePushSubscription } from '../hooks/use-push-subscription';

const useStyles = makeStyles({
  card: { marginBottom: tokens.spacingVerticalL, gap: tokens.spacingVerticalS },
  row: { display: 'flex', flexWrap: 'wrap', alignItems: 'center', gap: tokens.spacingHorizontalM },
});

/** Push opt-in for this browser, with a clear message where it cannot subscribe. */
export function PushOptIn() {
  const styles = useStyles();
  const { state, error, subscribe, unsubscribe } = usePushSubscription();

  return (
    <Card className={styles.card} aria-labelledby="push-opt-in-title">
      <Subtitle2 as="h2" id="push-opt-in-title">
        Push notifications on this device
      </Subtitle2>
      {state.status === 'unsupported' && (
        <MessageBar intent="warning" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>Not available in this browser</MessageBarTitle>
            {state.reason}
          </MessageBarBody>
        </MessageBar>
      )}
      {state.status === 'denied' && (
        <MessageBar intent="warning" layout="multiline">
          <MessageBarBody>
            <MessageBarTitle>Notifications are blocked</MessageBarTitle>
            This browser blocks notifications from Hopwise. Allow them in the site settings, then
            come back here to turn push on.
          </MessageBarBody>
        </MessageBar>
      )}
      {(state.status === 'off' ||
        state.status === 'on' ||
        state.status === 'busy' ||
        state.status === 'checking') && (
        <div className={styles.row}>
          <Body1>
            {state.status === 'on'
              ? 'On: notices also arrive as notifications on this device.'
              : state.status === 'off'
                ? 'Off: notices arrive in this inbox and by e-mail.'
                : 'Checking…'}
          </Body1>
          {state.status === 'on' ? (
            <Button onClick={() => void unsubscribe()}>Turn off push</Button>
          ) : (
            <Button
              appearance="primary"
              disabled={state.status !== 'off'}
              onClick={() => void subscribe()}
            >
              Turn on push
            </Button>
          )}
        </div>
      )}
      {error && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>{error}</MessageBarBody>
        </MessageBar>
      )}
    </Card>
  );
}
