import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  MessageBar,
  MessageBarBody,
  Spinner,
} from '@fluentui/react-components';
import type { ReactNode } from 'react';

interface PublishDialogProps {
  open: boolean;
  title: string;
  children: ReactNode;
  busy: boolean;
  error?: string;
  onPublish: () => void;
  onCancel: () => void;
}

/** Asks before publishing a new schedule version, with the safety caution and any server error. */
export function PublishDialog({
  open,
  title,
  children,
  busy,
  error,
  onPublish,
  onCancel,
}: PublishDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(_, data) => !data.open && onCancel()}>
      <DialogSurface>
        <DialogBody>
          <DialogTitle>{title}</DialogTitle>
          <DialogContent>
            {error && (
              <MessageBar intent="error" role="alert" style={{ marginBottom: 12 }}>
                <MessageBarBody>{error}</MessageBarBody>
              </MessageBar>
            )}
            {children}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={onCancel} disabled={busy}>
              Cancel
            </Button>
            <Button
              appearance="primary"
              onClick={onPublish}
              disabled={busy}
              icon={busy ? <Spinner size="tiny" aria-hidden /> : undefined}
            >
              Publish
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}
