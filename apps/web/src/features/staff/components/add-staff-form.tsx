// The lead's form for adding a person. Rules come from the shared contract; the API's refusals
// (an e-mail already in use, a field it rejects) are put back beside the field they concern.
import { createStaffRequestSchema, roleLabels, type CreateStaffRequest } from '@heatpath/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type Path } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useCreateStaffMember } from '../api/create-staff-member';
import { PersonFields } from './person-fields';

const formFields = ['name', 'email', 'role', 'password'] as const;
type FormField = (typeof formFields)[number] & Path<CreateStaffRequest>;

function isFormField(name: string): name is FormField {
  return (formFields as readonly string[]).includes(name);
}

export function AddStaffForm() {
  const create = useCreateStaffMember();
  const [added, setAdded] = useState<string | null>(null);
  const form = useForm({
    resolver: zodResolver(createStaffRequestSchema),
    defaultValues: { name: '', email: '', role: 'technician' as const, password: '' },
  });
  const { errors } = form.formState;

  const submit = form.handleSubmit((values) => {
    setAdded(null);
    create.mutate(values, {
      onSuccess: (member) => {
        setAdded(`${member.name} can now sign in as ${roleLabels[member.role]}.`);
        form.reset();
      },
      onError: (error) => {
        if (!isApiError(error)) return;
        for (const [field, message] of Object.entries(error.fields)) {
          if (isFormField(field)) form.setError(field, { message });
        }
        if (error.code === 'conflict') form.setError('email', { message: error.message });
      },
    });
  });

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="add-staff-heading"
      className="flex flex-col gap-5"
    >
      <h2 id="add-staff-heading" className="text-xl font-bold">
        Add a staff member
      </h2>
      {create.error ? (
        <Alert tone="danger" role="alert" title="Not added">
          <p>{create.error.message}</p>
        </Alert>
      ) : null}
      {added ? (
        <Alert tone="ok" role="status" title="Added">
          <p>{added}</p>
        </Alert>
      ) : null}
      <div className="grid gap-5 lg:grid-cols-2">
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
        <TextField
          label="First password"
          type="password"
          autoComplete="new-password"
          hint="At least 10 characters. Give it to the person yourself, not by e-mail."
          error={errors.password?.message}
          {...form.register('password')}
        />
      </div>
      <div>
        <Button type="submit" busy={create.isPending} busyLabel="Adding…">
          Add staff member
        </Button>
      </div>
    </form>
  );
}
