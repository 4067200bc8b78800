import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  type DialogProps,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  MessageBar,
  MessageBarBody,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import type { FormEvent, ReactElement, ReactNode } from 'react';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

interface FormDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  title: string;
  /** A button that opens the dialog, if the dialog brings its own. */
  trigger?: ReactElement;
  /** Runs on submit (the button or Enter); the page does not reload. */
  onSubmit: () => void;
  submitLabel: string;
  /** The submit button's text while the request runs; `submitLabel` if not given. */
  pendingLabel?: string;
  pending: boolean;
  /** A server error that names none of the fields, shown above them. */
  error?: string;
  /** The fields, one under another. */
  children: ReactNode;
}

/** A dialog holding a form: title, the fields, a general error, Cancel and a submit button. */
export function FormDialog({
  open,
  onOpenChange,
  title,
  trigger,
  onSubmit,
  submitLabel,
  pendingLabel = submitLabel,
  pending,
  error,
  children,
}: FormDialogProps) {
  const styles = useStyles();
  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    onSubmit();
  };
  const surface = (
    <DialogSurface aria-describedby={undefined}>
      <form onSubmit={submit} noValidate>
        <DialogBody>
          <DialogTitle>{title}</DialogTitle>
          <DialogContent className={styles.form}>
            {error && (
              <MessageBar intent="error" role="alert">
                <MessageBarBody>{error}</MessageBarBody>
              </MessageBar>
            )}
            {children}
          </DialogContent>
          <DialogActions>
            <Button appearance="secondary" onClick={() => onOpenChange(false)}>
              Cancel
            </Button>
            <Button
              type="submit"
              appearance="primary"
              disabled={pending}
              icon={pending ? <Spinner size="tiny" aria-hidden /> : undefined}
            >
              {pending ? pendingLabel : submitLabel}
            </Button>
          </DialogActions>
        </DialogBody>
      </form>
    </DialogSurface>
  );
  const onDialogOpenChange: DialogProps['onOpenChange'] = (_, data) => onOpenChange(data.open);
  if (!trigger) {
    return (
      <Dialog open={open} onOpenChange={onDialogOpenChange}>
        {surface}
      </Dialog>
    );
  }
  return (
    <Dialog open={open} onOpenChange={onDialogOpenChange}>
      <DialogTrigger disableButtonEnhancement>{trigger}</DialogTrigger>
      {surface}
    </Dialog>
  );
}
