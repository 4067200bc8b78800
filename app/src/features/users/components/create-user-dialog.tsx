import { Button, Field, Input, Select } from '@fluentui/react-components';
import { PersonAdd24Regular } from '@fluentui/react-icons';
import { ROLES, isRole, type Role } from '@hopwise/common';
import { useState } from 'react';
import { FormDialog } from '@/components/form-dialog';
import { useFormErrors, type FieldErrors } from '@/hooks/use-form-errors';
import { useNotify } from '@/hooks/use-notify';
import { roleLabel } from '@/utils/role-labels';
import { MIN_PASSWORD_LENGTH, useCreateUser, type CreateUserInput } from '../api/create-user';

type FieldName = keyof CreateUserInput;

const EMPTY: CreateUserInput = { email: '', displayName: '', password: '', role: 'operator' };
const FIELD_NAMES: FieldName[] = ['email', 'displayName', 'password', 'role'];
const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

function validate(input: CreateUserInput): FieldErrors<FieldName> {
  const errors: FieldErrors<FieldName> = {};
  if (!EMAIL_PATTERN.test(input.email.trim()))
    errors.email = 'Enter an e-mail address like name@example.org.';
  if (!input.displayName.trim()) errors.displayName = 'Enter the name people will see.';
  if (input.password.length < MIN_PASSWORD_LENGTH) {
    errors.password = `Use at least ${MIN_PASSWORD_LENGTH} characters.`;
  }
  return errors;
}

export function CreateUserDialog() {
  const notify = useNotify();
  const [open, setOpen] = useState(false);
  const [values, setValues] = useState<CreateUserInput>(EMPTY);
  const create = useCreateUser({
    onSuccess: (user) => {
      notify('success', 'User added', `${user.email} can now sign in as ${roleLabel(user.role)}.`);
      setOpen(false);
    },
  });
  const { setErrors, clearError, formError, fieldProps } = useFormErrors(FIELD_NAMES, create.error);

  const reset = () => {
    setValues(EMPTY);
    setErrors({});
    create.reset();
  };

  const set = (name: FieldName) => (value: string) => {
    setValues((previous) => ({ ...previous, [name]: value }));
    clearError(name);
  };

  const onSubmit = () => {
    const found = validate(values);
    setErrors(found);
    if (Object.values(found).some(Boolean)) return;
    create.mutate({
      ...values,
      email: values.email.trim(),
      displayName: values.displayName.trim(),
    });
  };

  return (
    <FormDialog
      open={open}
      onOpenChange={(next) => {
        setOpen(next);
        if (next) reset();
      }}
      trigger={
        <Button appearance="primary" icon={<PersonAdd24Regular />}>
          Add user
        </Button>
      }
      title="Add a user"
      onSubmit={onSubmit}
      submitLabel="Add user"
      pendingLabel="Adding…"
      pending={create.isPending}
      error={formError}
    >
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
    </FormDialog>
  );
}
