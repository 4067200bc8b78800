import {
  Button,
  Dialog,
  DialogActions,
  DialogBody,
  DialogContent,
  DialogSurface,
  DialogTitle,
  DialogTrigger,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  Select,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { PersonAdd24Regular } from '@fluentui/react-icons';
import { ROLES, isRole, type Role } from '@hopwise/common';
import { useState, type FormEvent } from 'react';
import { useNotify } from '@/hooks/use-notify';
import { isApiError } from '@/lib/api-client';
import { roleLabel } from '@/utils/role-labels';
import { MIN_PASSWORD_LENGTH, useCreateUser, type CreateUserInput } from '../api/create-user';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

type FieldName = keyof CreateUserInput;
type FieldErrors = Partial<Record<FieldName, string>>;

const EMPTY: CreateUserInput = { email: '', displayName: '', password: '', role: 'operator' };
const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

function validate(input: CreateUserInput): FieldErrors {
  const errors: FieldErrors = {};
  if (!EMAIL_PATTERN.test(input.email.trim()))
    errors.email = 'Enter an e-mail address like name@example.org.';
  if (!input.displayName.trim()) errors.displayName = 'Enter the name people will see.';
  if (input.password.length < MIN_PASSWORD_LENGTH) {
    errors.password = `Use at least ${MIN_PASSWORD_LENGTH} characters.`;
  }
  return errors;
}

export function CreateUserDialog() {
  const styles = useStyles();
  const notify = useNotify();
  const [open, setOpen] = useState(false);
  const [values, setValues] = useState<CreateUserInput>(EMPTY);
  const [errors, setErrors] = useState<FieldErrors>({});
  const create = useCreateUser({
    onSuccess: (user) => {
      notify('success', 'User added', `${user.email} can now sign in as ${roleLabel(user.role)}.`);
      setOpen(false);
    },
  });

  const serverError = create.error;
  const serverFields = isApiError(serverError) ? serverError.fields : undefined;
  // A server message that names none of our fields is shown above the form.
  const namesAField = Object.keys(serverFields ?? {}).some((name) => name in EMPTY);
  const formError = serverError && !namesAField ? serverError.message : undefined;

  const reset = () => {
    setValues(EMPTY);
    setErrors({});
    create.reset();
  };

  const set = (name: FieldName) => (value: string) => {
    setValues((previous) => ({ ...previous, [name]: value }));
    setErrors((previous) => ({ ...previous, [name]: undefined }));
  };

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found = validate(values);
    setErrors(found);
    if (Object.values(found).some(Boolean)) return;
    create.mutate({
      ...values,
      email: values.email.trim(),
      displayName: values.displayName.trim(),
    });
  };

  const message = (name: FieldName) => errors[name] ?? serverFields?.[name];
  const fieldProps = (name: FieldName) => ({
    validationMessage: message(name),
    validationState: message(name) ? ('error' as const) : ('none' as const),
  });

  return (
    <Dialog
      open={open}
      onOpenChange={(_, data) => {
        setOpen(data.open);
        if (data.open) reset();
      }}
    >
      <DialogTrigger disableButtonEnhancement>
        <Button appearance="primary" icon={<PersonAdd24Regular />}>
          Add user
        </Button>
      </DialogTrigger>
      <DialogSurface aria-describedby={undefined}>
        <form onSubmit={onSubmit} noValidate>
          <DialogBody>
            <DialogTitle>Add a user</DialogTitle>
            <DialogContent className={styles.form}>
              {formError && (
                <MessageBar intent="error" role="alert">
                  <MessageBarBody>{formError}</MessageBarBody>
                </MessageBar>
              )}
              <Field label="E-mail" required {...fieldProps('email')}>
                <Input
                  type="email"
                  autoComplete="off"
                  value={values.email}
                  onChange={(_, data) => set('email')(data.value)}
                />
              </Field>
              <Field label="Display name" required {...fieldProps('displayName')}>
                <Input
                  autoComplete="off"
                  value={values.displayName}
                  onChange={(_, data) => set('displayName')(data.value)}
                />
              </Field>
              <Field
                label="Password"
                required
                hint={`At least ${MIN_PASSWORD_LENGTH} characters. Share it with the user privately.`}
                {...fieldProps('password')}
              >
                <Input
                  type="password"
                  autoComplete="new-password"
                  value={values.password}
                  onChange={(_, data) => set('password')(data.value)}
                />
              </Field>
              <Field label="Role" required {...fieldProps('role')}>
                <Select
                  value={values.role}
                  onChange={(_, data) => {
                    if (isRole(data.value)) set('role')(data.value satisfies Role);
                  }}
                >
                  {ROLES.map((role) => (
                    <option key={role} value={role}>
                      {roleLabel(role)}
                    </option>
                  ))}
                </Select>
              </Field>
            </DialogContent>
            <DialogActions>
              <DialogTrigger disableButtonEnhancement>
                <Button appearance="secondary">Cancel</Button>
              </DialogTrigger>
              <Button
                type="submit"
                appearance="primary"
                disabled={create.isPending}
                icon={create.isPending ? <Spinner size="tiny" aria-hidden /> : undefined}
              >
                {create.isPending ? 'Adding…' : 'Add user'}
              </Button>
            </DialogActions>
          </DialogBody>
        </form>
      </DialogSurface>
    </Dialog>
  );
}
