// Choosing a password from an invitation or reset link: it says whose link it is, takes the new
// password twice, and signs the person in. A used or expired link says so and where to go next.
import { passwordSchema } from '@heatpath/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router';
import { z } from 'zod';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { LoadingState } from '../../../components/ui/status';
import { useAccountLink, useSetPassword } from '../api/set-password';

const formSchema = z
  .object({ password: passwordSchema, repeat: z.string() })
  .refine((v) => v.password === v.repeat, {
    message: 'The two passwords differ; type the same one twice.',
    path: ['repeat'],
  });

export function SetPasswordForm({ token, onDone }: { token: string; onDone: () => void }) {
  const link = useAccountLink(token);
  const set = useSetPassword();
  const form = useForm({
    resolver: zodResolver(formSchema),
    defaultValues: { password: '', repeat: '' },
  });
  const { errors } = form.formState;

  if (token === '')
    return (
      <Alert tone="danger" role="alert" title="This link is incomplete">
        <p>Open the link from the e-mail again, or copy all of it into the address bar.</p>
      </Alert>
    );
  if (link.isPending) return <LoadingState label="Checking the link…" />;
  if (link.isError)
    return (
      <Alert tone="danger" role="alert" title="This link no longer works">
        <p>{link.error.message}</p>
        <p>
          <Link to="/forgot-password" className="font-semibold underline underline-offset-4">
            Ask for a new link
          </Link>{' '}
          or ask your workshop lead to invite you again.
        </p>
      </Alert>
    );

  const info = link.data;
  const submit = form.handleSubmit((values) =>
    set.mutate({ token, password: values.password }, { onSuccess: onDone }),
  );
  return (
    <form
      onSubmit={submit}
      noValidate
      aria-label="Choose a password"
      className="flex flex-col gap-5"
    >
      <p>
        {info.purpose === 'invitation'
          ? `Welcome to ${info.workshopName}, ${info.name}. Choose the password you will sign in with as ${info.email}.`
          : `Choose a new password for ${info.email} at ${info.workshopName}.`}
      </p>
      {set.error ? (
        <Alert tone="danger" role="alert" title="Password not set">
          <p>{set.error.message}</p>
        </Alert>
      ) : null}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        error={errors.password?.message}
        {...form.register('password')}
      />
      <TextField
        label="The same password again"
        type="password"
        autoComplete="new-password"
        error={errors.repeat?.message}
        {...form.register('repeat')}
      />
      <Button type="submit" size="large" busy={set.isPending} busyLabel="Saving…">
        Set password and sign in
      </Button>
    </form>
  );
}
