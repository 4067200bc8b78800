import {
  Button,
  MessageBar,
  MessageBarActions,
  MessageBarBody,
  MessageBarTitle,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import type { UseQueryResult } from '@tanstack/react-query';
import type { ReactNode } from 'react';

const useStyles = makeStyles({
  padded: { padding: tokens.spacingVerticalXXL },
});

interface QueryErrorBarProps {
  title: ReactNode;
  error: Error;
  onRetry: () => void;
  className?: string;
}

/** A failed load: what could not be loaded, the server's reason, and "Try again". */
export function QueryErrorBar({ title, error, onRetry, className }: QueryErrorBarProps) {
  return (
    <MessageBar className={className} intent="error" layout="multiline" role="alert">
      <MessageBarBody>
        <MessageBarTitle>{title}</MessageBarTitle>
        {error.message}
      </MessageBarBody>
      <MessageBarActions>
        <Button onClick={onRetry}>Try again</Button>
      </MessageBarActions>
    </MessageBar>
  );
}

interface QueryStateBoundaryProps<T> {
  query: UseQueryResult<T, Error>;
  /** The spinner's label while the first load runs ("Loading links…"). */
  loadingLabel: string;
  /** The error bar's title when the load fails ("Could not load links"). */
  errorTitle: ReactNode;
  /** Space around the spinner (for a view that has nothing else to show meanwhile). */
  padSpinner?: boolean;
  /** Shown instead of `children` when `isEmpty` says the loaded data has nothing to list. */
  empty?: ReactNode;
  isEmpty?: (data: T) => boolean;
  children: (data: T) => ReactNode;
}

/** A query's loading, failed and empty states, and its data once loaded. */
export function QueryStateBoundary<T>({
  query,
  loadingLabel,
  errorTitle,
  padSpinner = false,
  empty,
  isEmpty,
  children,
}: QueryStateBoundaryProps<T>) {
  const styles = useStyles();
  if (query.isPending) {
    return <Spinner className={padSpinner ? styles.padded : undefined} label={loadingLabel} />;
  }
  if (query.isError) {
    return (
      <QueryErrorBar title={errorTitle} error={query.error} onRetry={() => void query.refetch()} />
    );
  }
  if (empty !== undefined && isEmpty?.(query.data)) return empty;
  return children(query.data);
}
