// "Forgot your password?": one box for the address. The answer never says whether an account
// uses it, so the screen shows the same sentence either way.
import { passwordResetRequestSchema } from '@heatpath/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm() {
  const request = useRequestPasswordReset();
  const form = useForm({
    resolver: zodResolver(passwordResetRequestSchema),
    defaultValues: { email: '' },
  });
  const { errors } = form.formState;
  const submit = form.handleSubmit((values) => request.mutate(values));

  if (request.isSuccess)
    return (
      <Alert tone="ok" role="status" title="Check your e-mail">
        <p>{request.data.message}</p>
        <p>No e-mail after a few minutes? Ask your workshop lead.</p>
      </Alert>
    );
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Ask for a new password"
      className="flex flex-col gap-5"
    >
      {request.error ? (
        <Alert tone="danger" role="alert" title="Not sent">
          <p>{request.error.message}</p>
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
      <Button type="submit" size="large" busy={request.isPending} busyLabel="Sending…">
        Send me a link
      </Button>
    </form>
  );
}
