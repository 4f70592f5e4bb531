// The sign-in form. Field rules come from the shared contract; the API's own message (wrong
// password, sign-in paused after too many wrong passwords) is shown in one alert above the
// button.
import { signInRequestSchema } from '@heatpath/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useSignIn } from '../api/sign-in';

interface SignInFormProps {
  onSignedIn: () => void;
}

export function SignInForm({ onSignedIn }: SignInFormProps) {
  const signIn = useSignIn();
  const form = useForm({
    resolver: zodResolver(signInRequestSchema),
    defaultValues: { email: '', password: '' },
  });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) => {
    signIn.mutate(values, {
      onSuccess: onSignedIn,
      // Keep the e-mail, clear the password: the next try starts from a clean box.
      onError: () => form.resetField('password'),
    });
  });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-5" aria-label="Sign in">
      {signIn.error ? (
        <Alert
          tone="danger"
          role="alert"
          title={
            isApiError(signIn.error) && signIn.error.status === 429
              ? 'Sign-in paused'
              : 'Not signed in'
          }
        >
          <p>{signIn.error.message}</p>
        </Alert>
      ) : null}
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="username"
        inputMode="email"
        autoCapitalize="none"
        spellCheck={false}
        error={errors.email?.message}
        {...form.register('email')}
      />
      <TextField
        label="Password"
        type="password"
        autoComplete="current-password"
        error={errors.password?.message}
        {...form.register('password')}
      />
      <Button type="submit" size="large" busy={signIn.isPending} busyLabel="Signing in…">
        Sign in
      </Button>
    </form>
  );
}
