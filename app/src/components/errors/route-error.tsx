import {
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
} from '@fluentui/react-components';
import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { PageHeader } from '../page-header';

function describe(error: unknown): string {
  if (isRouteErrorResponse(error)) return `${error.status} ${error.statusText}`;
  if (error instanceof Error) {
    // A lazy route chunk that vanished after a new deployment.
    if (/dynamically imported module|Importing a module script failed/i.test(error.message)) {
      return 'A part of Hopwise was updated while this page was open. Reload to get the new version.';
    }
    return error.message;
  }
  return 'Unknown error';
}

/** The error boundary of every route module. */
export function RouteError() {
  const error = useRouteError();
  return (
    <div role="alert">
      <PageHeader title="Something went wrong" />
      <MessageBar intent="error" layout="multiline">
        <MessageBarBody>
          <MessageBarTitle>This page could not be shown</MessageBarTitle>
          {describe(error)}
        </MessageBarBody>
        <MessageBarActions>
          <Button onClick={() => window.location.reload()}>Reload</Button>
        </MessageBarActions>
      </MessageBar>
    </div>
  );
}
