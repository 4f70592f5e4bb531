// The lead invites a person by e-mail: they get a link that works once and for a limited time to
// choose their own password. The API's refusals (an address in use) go back beside the field.
import { inviteStaffRequestSchema, roleLabels, type InviteStaffRequest } from '@heatpath/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type Path } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { isApiError } from '../../../lib/api-client';
import { useInviteStaffMember } from '../api/invite-staff-member';
import { PersonFields } from './person-fields';

const formFields = ['name', 'email', 'role'] as const;
type FormField = (typeof formFields)[number] & Path<InviteStaffRequest>;
const isFormField = (name: string): name is FormField =>
  (formFields as readonly string[]).includes(name);

export function InviteStaffForm() {
  const invite = useInviteStaffMember();
  const [invited, setInvited] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(inviteStaffRequestSchema),
    defaultValues: { name: '', email: '', role: 'technician' as const },
  });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) => {
    setInvited(null);
    invite.mutate(values, {
      onSuccess: (member) => {
        setInvited(
          `${member.name} is invited as ${roleLabels[member.role].toLowerCase()}. The e-mail with their link is in the outbox.`,
        );
        form.reset();
      },
      onError: (error) => {
        if (!isApiError(error)) return;
        for (const [field, message] of Object.entries(error.fields))
          if (isFormField(field)) form.setError(field, { message });
        if (error.code === 'conflict') form.setError('email', { message: error.message });
      },
    });
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="invite-heading"
      className="flex flex-col gap-5"
    >
      <div className="flex flex-col gap-1">
        <h2 id="invite-heading" className="text-xl font-bold">
          Invite by e-mail
        </h2>
        <p className="text-ink-muted">
          The person gets a link to choose their own password. It works once and only for a limited
          time; you can send a fresh one from their row.
        </p>
      </div>
      {invite.error ? (
        <Alert tone="danger" role="alert" title="Not invited">
          <p>{invite.error.message}</p>
        </Alert>
      ) : null}
      {invited ? (
        <Alert tone="ok" role="status" title="Invitation written">
          <p>{invited}</p>
        </Alert>
      ) : null}
      <div className="grid gap-5 lg:grid-cols-3">
        <PersonFields
          register={{
            name: form.register('name'),
            email: form.register('email'),
            role: form.register('role'),
          }}
          errors={{
            name: errors.name?.message,
            email: errors.email?.message,
            role: errors.role?.message,
          }}
        />
      </div>
      <div>
        <Button type="submit" busy={invite.isPending} busyLabel="Inviting…">
          Send invitation
        </Button>
      </div>
    </form>
  );
}
