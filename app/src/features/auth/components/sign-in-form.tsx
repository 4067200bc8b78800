import {
  Button,
  Field,
  Input,
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState, type FormEvent } from 'react';
import { isApiError } from '@/lib/api-client';
import { useLogin } from '../api/login';

const useStyles = makeStyles({
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalL },
  submit: { alignSelf: 'stretch' },
});

interface FieldErrors {
  email?: string;
  password?: string;
}

const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

function validate(email: string, password: string): FieldErrors {
  const errors: FieldErrors = {};
  if (!email.trim()) errors.email = 'Enter your e-mail address.';
  else if (!EMAIL_PATTERN.test(email.trim()))
    errors.email = 'Enter an e-mail address like name@example.org.';
  if (!password) errors.password = 'Enter your password.';
  return errors;
}

export function SignInForm({ onSuccess }: { onSuccess: () => void }) {
  const styles = useStyles();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [errors, setErrors] = useState<FieldErrors>({});
  const login = useLogin({ onSuccess });

  const serverError = login.error;
  const serverFields = isApiError(serverError) ? serverError.fields : undefined;

  const onSubmit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const found = validate(email, password);
    setErrors(found);
    if (found.email || found.password) return;
    login.mutate({ email: email.trim(), password });
  };

  return (
    <form className={styles.form} onSubmit={onSubmit} noValidate aria-label="Sign in">
      {serverError && (
        <MessageBar intent="error" role="alert">
          <MessageBarBody>
            <MessageBarTitle>Sign-in failed</MessageBarTitle>
            {serverError.message}
          </MessageBarBody>
        </MessageBar>
      )}
      <Field
        label="E-mail"
        required
        validationMessage={errors.email ?? serverFields?.email}
        validationState={(errors.email ?? serverFields?.email) ? 'error' : 'none'}
      >
        <Input
          type="email"
          name="email"
          autoComplete="username"
          value={email}
          onChange={(_, data) => setEmail(data.value)}
        />
      </Field>
      <Field
        label="Password"
        required
        validationMessage={errors.password ?? serverFields?.password}
        validationState={(errors.password ?? serverFields?.password) ? 'error' : 'none'}
      >
        <Input
          type="password"
          name="password"
          autoComplete="current-password"
          value={password}
          onChange={(_, data) => setPassword(data.value)}
        />
      </Field>
      <Button
        className={styles.submit}
        appearance="primary"
        type="submit"
        disabled={login.isPending}
        icon={login.isPending ? <Spinner size="tiny" aria-hidden /> : undefined}
      >
        {login.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
