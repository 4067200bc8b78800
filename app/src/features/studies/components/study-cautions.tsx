import { MessageBar, MessageBarBody, MessageBarTitle } from '@fluentui/react-components';

/** The safety notes of SPEC §6, shown beside every set of results. */
export function StudyCautions() {
  return (
    <MessageBar intent="warning" layout="multiline" aria-label="Before you act on these results">
      <MessageBarBody>
        <MessageBarTitle>Before you act on these results</MessageBarTitle>
        Predictions are estimates: the ionosphere changes from hour to hour, so keep an alternative
        path for safety-of-life traffic. Transmit only on channels your licence or assignment
        allows. The RF-exposure limits of your local regulations apply.
      </MessageBarBody>
    </MessageBar>
  );
}
