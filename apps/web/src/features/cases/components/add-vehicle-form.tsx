// Adds a vehicle that is not on file yet. The shared contract's rules check the form; the VIN is
// checked live as it is typed; a VIN or plate already on file (409) offers that vehicle instead.
import {
  distanceUnits,
  fuelKinds,
  fuelLabels,
  normaliseVin,
  vehicleInputSchema,
  type Vehicle,
} from '@heatpath/contracts';
import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { isApiError } from '../../../lib/api-client';
import { useCreateVehicle } from '../api/create-vehicle';
import { useVehicleSearch } from '../api/find-vehicles';
import { vehicleName, vehicleTag } from '../case-format';
import { VinCheck, vinProblem } from './vin-check';

const formFields = ['vin', 'plate', 'make', 'model', 'year', 'engine', 'fuel', 'mileage'] as const;
type FormField = (typeof formFields)[number];

function isFormField(name: string): name is FormField {
  return (formFields as readonly string[]).includes(name);
}

const blankToUndefined = (value: unknown) => (value === '' ? undefined : value);

interface AddVehicleFormProps {
  /** What was typed in the search box: a 17-character entry starts as the VIN, else the plate. */
  initialQuery: string;
  onAdded: (vehicle: Vehicle) => void;
  onCancel: () => void;
}

export function AddVehicleForm({ initialQuery, onAdded, onCancel }: AddVehicleFormProps) {
  const create = useCreateVehicle();
  const vinCheckId = useId();
  const [duplicateOf, setDuplicateOf] = useState<string | null>(null);
  const looksLikeVin = normaliseVin(initialQuery).length === 17;
  const form = useForm({
    resolver: zodResolver(vehicleInputSchema),
    defaultValues: {
      vin: looksLikeVin ? normaliseVin(initialQuery) : '',
      plate: looksLikeVin ? '' : initialQuery.trim().toUpperCase(),
      make: '',
      model: '',
      year: '',
      engine: '',
      fuel: undefined,
      mileage: '',
      mileageUnit: 'km' as const,
    },
  });
  const { errors } = form.formState;
  const vin = useWatch({ control: form.control, name: 'vin' }) ?? '';
  const duplicates = useVehicleSearch(duplicateOf ?? '');

  const submit = form.handleSubmit((values) => {
    setDuplicateOf(null);
    create.mutate(values, {
      onSuccess: onAdded,
      onError: (error) => {
        if (!isApiError(error)) return;
        for (const [field, message] of Object.entries(error.fields)) {
          if (isFormField(field)) form.setError(field, { message });
        }
        if (error.code === 'conflict') setDuplicateOf(values.vin ?? values.plate ?? null);
      },
    });
  });

  const found = duplicateOf ? (duplicates.data?.vehicles ?? []) : [];

  return (
    <form
      onSubmit={submit}
      noValidate
      aria-labelledby="add-vehicle-heading"
      className="flex flex-col gap-5"
    >
      <h3 id="add-vehicle-heading" className="text-lg font-bold">
        Add a vehicle
      </h3>
      {create.error ? (
        <Alert
          tone="danger"
          role="alert"
          title={
            isApiError(create.error) && create.error.status === 409
              ? 'Already on file'
              : 'Vehicle not added'
          }
        >
          <p>{create.error.message}</p>
          {found.map((vehicle) => (
            <div key={vehicle.id}>
              <Button variant="primary" onClick={() => onAdded(vehicle)}>
                Use {vehicleTag(vehicle)}, {vehicleName(vehicle)}
              </Button>
            </div>
          ))}
        </Alert>
      ) : null}
      <div className="grid gap-5 md:grid-cols-2">
        <div className="flex flex-col gap-2">
          <TextField
            label="VIN"
            hint="17 characters, on the windscreen base or the door pillar. Leave empty if unknown."
            autoCapitalize="characters"
            autoComplete="off"
            spellCheck={false}
            maxLength={24}
            className="uppercase"
            error={errors.vin?.message ?? vinProblem(vin)}
            {...form.register('vin')}
          />
          <VinCheck id={vinCheckId} vin={vin} />
        </div>
        <TextField
          label="Registration plate"
          autoCapitalize="characters"
          autoComplete="off"
          spellCheck={false}
          className="uppercase"
          error={errors.plate?.message}
          {...form.register('plate')}
        />
        <TextField
          label="Make"
          autoComplete="off"
          error={errors.make?.message}
          {...form.register('make')}
        />
        <TextField
          label="Model"
          autoComplete="off"
          error={errors.model?.message}
          {...form.register('model')}
        />
        <TextField
          label="Model year"
          inputMode="numeric"
          autoComplete="off"
          error={errors.year?.message}
          {...form.register('year', { setValueAs: blankToUndefined })}
        />
        <TextField
          label="Engine"
          hint="For example “1.4 turbo petrol, switchable pump”"
          autoComplete="off"
          error={errors.engine?.message}
          {...form.register('engine')}
        />
        <SelectField
          label="Fuel"
          error={errors.fuel?.message}
          options={[
            { value: '', label: 'Not recorded' },
            ...fuelKinds.map((fuel) => ({ value: fuel, label: fuelLabels[fuel] })),
          ]}
          {...form.register('fuel', { setValueAs: blankToUndefined })}
        />
        <div className="grid grid-cols-[1fr_auto] items-end gap-3">
          <TextField
            label="Mileage"
            inputMode="numeric"
            autoComplete="off"
            error={errors.mileage?.message}
            {...form.register('mileage', { setValueAs: blankToUndefined })}
          />
          <Controller
            control={form.control}
            name="mileageUnit"
            render={({ field }) => (
              <SegmentedChoice
                legend="Mileage unit"
                value={field.value ?? 'km'}
                choices={distanceUnits.map((unit) => ({ value: unit, label: unit }))}
                onChange={field.onChange}
              />
            )}
          />
        </div>
      </div>
      <div className="flex flex-wrap gap-3">
        <Button type="submit" busy={create.isPending} busyLabel="Saving…">
          Save vehicle
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
