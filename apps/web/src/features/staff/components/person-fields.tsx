// The three fields every new staff member needs — name, e-mail address, role — shared by the
// add form (with a first password) and the invitation form.
import type { UseFormRegisterReturn } from 'react-hook-form';
import { SelectField, TextField } from '../../../components/ui/field';
import { roleOptions } from './role-options';

type Field = 'name' | 'email' | 'role';

export function PersonFields({
  register,
  errors,
}: {
  register: Record<Field, UseFormRegisterReturn>;
  errors: Partial<Record<Field, string>>;
}) {
  return (
    <>
      <TextField label="Name" autoComplete="off" error={errors.name} {...register.name} />
      <TextField
        label="E-mail address"
        type="email"
        inputMode="email"
        autoCapitalize="none"
        autoComplete="off"
        spellCheck={false}
        error={errors.email}
        {...register.email}
      />
      <SelectField label="Role" options={roleOptions} error={errors.role} {...register.role} />
    </>
  );
}
