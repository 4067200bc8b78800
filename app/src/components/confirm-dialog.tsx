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

interface ConfirmDialogProps {
  open: boolean;
  title: string;
  children: ReactNode;
  confirmLabel: string;
  busy?: boolean;
  error?: string;
  /** 'alert' (the default) for a destructive action; 'modal' for one that is not (publishing). */
  modalType?: 'alert' | 'modal';
  onConfirm: () => void;
  onCancel: () => void;
}

/** A dialog that asks before an action (delete, publish), with the server's error if any. */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  busy = false,
  error,
  modalType = 'alert',
  onConfirm,
  onCancel,
}: ConfirmDialogProps) {
  return (
    <Dialog modalType={modalType} open={open} onOpenChange={(_, data) => !data.open && onCancel()}>
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
              onClick={onConfirm}
              disabled={busy}
              icon={busy ? <Spinner size="tiny" aria-hidden /> : undefined}
            >
              {confirmLabel}
            </Button>
          </DialogActions>
        </DialogBody>
      </DialogSurface>
    </Dialog>
  );
}

interface DeleteMutation {
  isPending: boolean;
  error: Error | null;
  mutate: (id: number) => void;
  reset: () => void;
}

interface DeleteConfirmDialogProps<T extends { id: number }> {
  /** The item to delete; the dialog is open while there is one. */
  item: T | undefined;
  /** The delete mutation, called with the item's id. */
  mutation: DeleteMutation;
  title: string;
  confirmLabel: string;
  /** Clear `item`: on cancel, and from the mutation's onSuccess once deleted. */
  onClose: () => void;
  children: ReactNode;
}

/** Asks before deleting `item`; a cancel also forgets the last failed attempt. */
export function DeleteConfirmDialog<T extends { id: number }>({
  item,
  mutation,
  onClose,
  ...rest
}: DeleteConfirmDialogProps<T>) {
  return (
    <ConfirmDialog
      {...rest}
      open={item !== undefined}
      busy={mutation.isPending}
      error={mutation.error?.message}
      onConfirm={() => item && mutation.mutate(item.id)}
      onCancel={() => {
        onClose();
        mutation.reset();
      }}
    />
  );
}
