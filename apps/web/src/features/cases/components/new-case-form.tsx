// A new case at the front of the car: the vehicle (found or added), the customer, the complaint in
// the customer's words, the mileage, and the symptom whose tree the case will follow. The shared
// contract checks the whole request before it is sent; the API's refusals go beside their field.
import {
  createCaseRequestSchema,
  distanceUnits,
  type CaseDetail,
  type Vehicle,
} from '@heatpath/contracts';
import { useState } from 'react';
import { useForm, useWatch, type Path } from 'react-hook-form';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { FieldError, SelectField, TextAreaField, TextField } from '../../../components/ui/field';
import { Panel } from '../../../components/ui/page';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { isApiError } from '../../../lib/api-client';
import { useAvailableTrees } from '../api/get-available-trees';
import { useCreateCase } from '../api/create-case';
import { formatMileage } from '../case-format';
import type { PersonOption } from './case-list';
import { CustomerPicker, type CustomerChoice } from './customer-picker';
import { VehicleFinder } from './vehicle-finder';

interface NewCaseFormValues {
  complaint: string;
  mileageAtIntake: string;
  mileageUnit: 'km' | 'mi';
  treeId: string;
  assignedTo: string;
  newCustomer: { name: string; phone: string; email: string };
}

const formFields = [
  'complaint',
  'mileageAtIntake',
  'treeId',
  'assignedTo',
  'newCustomer.name',
  'newCustomer.phone',
  'newCustomer.email',
] as const;

function isFormField(name: string): name is (typeof formFields)[number] & Path<NewCaseFormValues> {
  return (formFields as readonly string[]).includes(name);
}

interface NewCaseFormProps {
  /** People a lead may give the case to (the lead first, as "Me"); absent for everyone else. */
  assignees?: readonly PersonOption[] | undefined;
  onCreated: (detail: CaseDetail) => void;
}

export function NewCaseForm({ assignees, onCreated }: NewCaseFormProps) {
  const trees = useAvailableTrees();
  const create = useCreateCase();
  const [vehicle, setVehicle] = useState<Vehicle | null>(null);
  const [vehicleError, setVehicleError] = useState<string | null>(null);
  const [customer, setCustomer] = useState<CustomerChoice>({ kind: 'none' });
  const form = useForm<NewCaseFormValues>({
    defaultValues: {
      complaint: '',
      mileageAtIntake: '',
      mileageUnit: 'km',
      treeId: '',
      assignedTo: '',
      newCustomer: { name: '', phone: '', email: '' },
    },
  });
  const { errors } = form.formState;
  const mileageUnit = useWatch({ control: form.control, name: 'mileageUnit' });
  const treeId = useWatch({ control: form.control, name: 'treeId' });

  const chooseVehicle = (chosen: Vehicle | null) => {
    setVehicle(chosen);
    setVehicleError(null);
    setCustomer(chosen?.customer ? { kind: 'on-file' } : { kind: 'none' });
    if (chosen) form.setValue('mileageUnit', chosen.mileageUnit);
  };

  const submit = form.handleSubmit((values) => {
    form.clearErrors();
    setVehicleError(null);
    const mileage = values.mileageAtIntake.trim().replace(/[\s,.]/g, '');
    const parsed = createCaseRequestSchema.safeParse({
      vehicleId: vehicle?.id,
      customerId: customer.kind === 'existing' ? customer.customer.id : undefined,
      newCustomer: customer.kind === 'new' ? values.newCustomer : undefined,
      complaint: values.complaint,
      mileageAtIntake: mileage === '' ? undefined : mileage,
      mileageUnit: values.mileageUnit,
      treeId: values.treeId,
      assignedTo: values.assignedTo || undefined,
    });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = issue.path.join('.');
        if (field === 'vehicleId') setVehicleError(issue.message);
        else if (isFormField(field)) form.setError(field, { message: issue.message });
      }
      return;
    }
    create.mutate(parsed.data, {
      onSuccess: onCreated,
      onError: (error) => {
        if (!isApiError(error)) return;
        for (const [field, message] of Object.entries(error.fields)) {
          if (field === 'vehicleId') setVehicleError(message);
          else if (isFormField(field)) form.setError(field, { message });
        }
      },
    });
  });

  const lastMileage = vehicle ? formatMileage(vehicle.mileage, vehicle.mileageUnit) : null;

  return (
    <div className="flex flex-col gap-6">
      <Panel labelledBy="vehicle-heading">
        <h2 id="vehicle-heading" className="mb-4 text-xl font-bold">
          1. Vehicle
        </h2>
        <VehicleFinder selected={vehicle} onSelect={chooseVehicle} />
        {vehicleError ? (
          <div className="mt-3">
            <FieldError id="vehicle-error" message={vehicleError} />
          </div>
        ) : null}
      </Panel>

      <form onSubmit={submit} noValidate aria-label="New case" className="flex flex-col gap-6">
        <Panel labelledBy="customer-heading">
          <h2 id="customer-heading" className="mb-4 text-xl font-bold">
            2. Customer
          </h2>
          <div className="flex flex-col gap-5">
            <CustomerPicker vehicle={vehicle} choice={customer} onChange={setCustomer} />
            {customer.kind === 'new' ? (
              <div className="grid gap-5 md:grid-cols-3">
                <TextField
                  label="Customer name"
                  autoComplete="off"
                  error={errors.newCustomer?.name?.message}
                  {...form.register('newCustomer.name')}
                />
                <TextField
                  label="Phone"
                  type="tel"
                  inputMode="tel"
                  autoComplete="off"
                  error={errors.newCustomer?.phone?.message}
                  {...form.register('newCustomer.phone')}
                />
                <TextField
                  label="E-mail address"
                  type="email"
                  inputMode="email"
                  autoCapitalize="none"
                  autoComplete="off"
                  spellCheck={false}
                  error={errors.newCustomer?.email?.message}
                  {...form.register('newCustomer.email')}
                />
              </div>
            ) : null}
          </div>
        </Panel>

        <Panel labelledBy="complaint-heading">
          <h2 id="complaint-heading" className="mb-4 text-xl font-bold">
            3. Complaint and mileage
          </h2>
          <div className="flex flex-col gap-5">
            <TextAreaField
              label="Complaint in the customer’s words"
              hint="Write it as they said it: “the gauge goes up in traffic”, not a diagnosis."
              rows={3}
              error={errors.complaint?.message}
              {...form.register('complaint')}
            />
            <div className="grid grid-cols-[minmax(0,16rem)_minmax(0,10rem)] items-end gap-3">
              <TextField
                label="Mileage at intake"
                inputMode="numeric"
                autoComplete="off"
                hint={lastMileage ? `Last recorded ${lastMileage}` : 'From the odometer'}
                error={errors.mileageAtIntake?.message}
                {...form.register('mileageAtIntake')}
              />
              <SegmentedChoice
                legend="Intake mileage unit"
                value={mileageUnit}
                choices={distanceUnits.map((unit) => ({ value: unit, label: unit }))}
                onChange={(unit) => form.setValue('mileageUnit', unit)}
              />
            </div>
            {assignees ? (
              <SelectField
                label="Assign to"
                options={[
                  { value: '', label: 'Not assigned yet' },
                  ...assignees.map((person) => ({ value: person.id, label: person.name })),
                ]}
                error={errors.assignedTo?.message}
                {...form.register('assignedTo')}
              />
            ) : null}
          </div>
        </Panel>

        <Panel labelledBy="symptom-heading">
          <fieldset
            className="flex flex-col gap-3"
            aria-describedby={errors.treeId ? 'tree-error' : undefined}
          >
            <legend id="symptom-heading" className="mb-4 text-xl font-bold">
              4. Starting symptom
            </legend>
            {trees.isPending ? (
              <LoadingState label="Loading symptoms…" />
            ) : trees.isError ? (
              <ErrorState
                title="Symptoms not loaded"
                message={trees.error.message}
                onRetry={() => void trees.refetch()}
                retrying={trees.isRefetching}
              />
            ) : trees.data.trees.length === 0 ? (
              <Alert tone="info" title="No decision tree yet">
                <p>A workshop lead publishes the trees cases start from.</p>
              </Alert>
            ) : (
              trees.data.trees.map((tree) => {
                const published = tree.latestPublished !== null;
                const checked = treeId === tree.id;
                return (
                  <label
                    key={tree.id}
                    className={
                      'flex min-h-touch cursor-pointer items-start gap-3 rounded-control border-2 px-4 py-3 ' +
                      'has-focus-visible:outline-3 has-focus-visible:outline-focus ' +
                      'has-disabled:cursor-not-allowed has-disabled:opacity-60 ' +
                      (checked ? 'border-primary bg-sunken' : 'border-line-strong bg-surface')
                    }
                  >
                    <input
                      type="radio"
                      value={tree.id}
                      disabled={!published}
                      className="mt-1 size-5 shrink-0 accent-primary"
                      {...form.register('treeId')}
                    />
                    <span className="flex flex-col gap-0.5">
                      <span className="font-semibold">{tree.title}</span>
                      <span className="text-sm text-ink-muted">
                        {published ? tree.symptom : 'No published version yet'}
                      </span>
                    </span>
                  </label>
                );
              })
            )}
            {errors.treeId?.message ? (
              <FieldError id="tree-error" message={errors.treeId.message} />
            ) : null}
          </fieldset>
        </Panel>

        {create.error ? (
          <Alert tone="danger" role="alert" title="Case not created">
            <p>{create.error.message}</p>
          </Alert>
        ) : null}
        <div>
          <Button type="submit" size="large" busy={create.isPending} busyLabel="Creating…">
            Create case
          </Button>
        </div>
      </form>
    </div>
  );
}
