// Step one of a new case: find the car by plate or VIN as it is typed, so a vehicle on file is
// reused, or add it when it is not there. The chosen vehicle is shown with its VIN warning.
import type { Vehicle } from '@heatpath/contracts';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { minVehicleQuery, useVehicleSearch } from '../api/find-vehicles';
import { formatMileage, vehicleName, vehicleTag } from '../case-format';
import { AddVehicleForm } from './add-vehicle-form';

interface VehicleFinderProps {
  selected: Vehicle | null;
  onSelect: (vehicle: Vehicle | null) => void;
}

export function VehicleFinder({ selected, onSelect }: VehicleFinderProps) {
  const [query, setQuery] = useState('');
  const [adding, setAdding] = useState(false);
  const settled = useDebouncedValue(query.trim(), 250);
  const search = useVehicleSearch(settled);

  if (selected) return <ChosenVehicle vehicle={selected} onChange={() => onSelect(null)} />;

  if (adding) {
    return (
      <AddVehicleForm
        initialQuery={query}
        onAdded={(vehicle) => {
          setAdding(false);
          onSelect(vehicle);
        }}
        onCancel={() => setAdding(false)}
      />
    );
  }

  const results = settled.length >= minVehicleQuery ? (search.data?.vehicles ?? []) : [];
  const searched =
    settled.length >= minVehicleQuery && search.isSuccess && !search.isPlaceholderData;

  return (
    <div className="flex flex-col gap-4">
      <TextField
        label="Plate or VIN"
        type="search"
        hint="Type the start of the registration plate or the VIN."
        value={query}
        onChange={(event) => setQuery(event.target.value)}
        autoCapitalize="characters"
        autoComplete="off"
        spellCheck={false}
        enterKeyHint="search"
      />
      {search.isError ? (
        <ErrorState
          title="Vehicles not searched"
          message={search.error.message}
          onRetry={() => void search.refetch()}
          retrying={search.isRefetching}
        />
      ) : search.isFetching && results.length === 0 ? (
        <LoadingState label="Searching vehicles…" />
      ) : null}
      {results.length > 0 ? (
        <ul className="flex flex-col gap-2" aria-label="Vehicles on file">
          {results.map((vehicle) => (
            <li key={vehicle.id}>
              <button
                type="button"
                onClick={() => onSelect(vehicle)}
                className="flex min-h-touch w-full flex-col items-start gap-0.5 rounded-control border-2 border-line-strong bg-surface px-4 py-3 text-left hover:bg-sunken"
              >
                <span className="text-lg font-bold">{vehicleTag(vehicle)}</span>
                <span>
                  {vehicleName(vehicle)}
                  {vehicle.customer ? ` · ${vehicle.customer.name}` : ''}
                </span>
                {vehicle.vin && vehicle.plate ? (
                  <span className="text-sm text-ink-muted">VIN {vehicle.vin}</span>
                ) : null}
              </button>
            </li>
          ))}
        </ul>
      ) : searched ? (
        <p role="status" className="font-semibold">
          No vehicle on file starts with “{settled}”.
        </p>
      ) : null}
      <div className="flex flex-wrap items-center gap-3">
        <Button
          variant={searched && results.length === 0 ? 'primary' : 'secondary'}
          onClick={() => setAdding(true)}
        >
          Add vehicle
        </Button>
        <span className="text-sm text-ink-muted">when it is not on file yet</span>
      </div>
    </div>
  );
}

function ChosenVehicle({ vehicle, onChange }: { vehicle: Vehicle; onChange: () => void }) {
  const mileage = formatMileage(vehicle.mileage, vehicle.mileageUnit);
  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-start justify-between gap-3 rounded-control border-2 border-primary bg-sunken p-4">
        <div className="flex flex-col gap-0.5">
          <span className="flex items-center gap-2 text-lg font-bold">
            <span aria-hidden="true">✓</span>
            {vehicleTag(vehicle)}
          </span>
          <span>{vehicleName(vehicle)}</span>
          {vehicle.engine ? <span className="text-sm text-ink-muted">{vehicle.engine}</span> : null}
          {vehicle.vin ? <span className="text-sm text-ink-muted">VIN {vehicle.vin}</span> : null}
          {mileage ? <span className="text-sm text-ink-muted">Last recorded {mileage}</span> : null}
        </div>
        <Button variant="secondary" onClick={onChange}>
          Change vehicle
        </Button>
      </div>
      {vehicle.vinWarning ? (
        <Alert tone="caution" title="Check this VIN">
          <p>{vehicle.vinWarning}</p>
        </Alert>
      ) : null}
    </div>
  );
}
