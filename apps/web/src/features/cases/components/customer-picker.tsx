// Step two of a new case: who the car belongs to. The vehicle's own customer is offered first;
// otherwise find one by name, or enter a new one (whose fields the new-case form owns).
import type { Customer, Vehicle } from '@heatpath/contracts';
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { minCustomerQuery, useCustomerSearch } from '../api/find-customers';

export type CustomerChoice =
  | { kind: 'on-file' }
  | { kind: 'existing'; customer: Customer }
  | { kind: 'new' }
  | { kind: 'none' };

interface CustomerPickerProps {
  vehicle: Vehicle | null;
  choice: CustomerChoice;
  onChange: (choice: CustomerChoice) => void;
}

export function CustomerPicker({ vehicle, choice, onChange }: CustomerPickerProps) {
  const onFile = vehicle?.customer ?? null;

  if (choice.kind === 'on-file' && onFile) {
    return (
      <Chosen
        name={onFile.name}
        detail={[onFile.phone, onFile.email].filter(Boolean).join(' · ')}
        note="On file for this vehicle"
        onChange={() => onChange({ kind: 'none' })}
      />
    );
  }
  if (choice.kind === 'existing') {
    return (
      <Chosen
        name={choice.customer.name}
        detail={[choice.customer.phone, choice.customer.email].filter(Boolean).join(' · ')}
        onChange={() => onChange({ kind: 'none' })}
      />
    );
  }
  if (choice.kind === 'new') {
    return (
      <div className="flex flex-wrap items-center gap-3">
        <p className="font-semibold">New customer: fill in the details below.</p>
        <Button variant="secondary" onClick={() => onChange({ kind: 'none' })}>
          Find a customer instead
        </Button>
      </div>
    );
  }
  return (
    <CustomerSearch
      onFile={onFile}
      onPick={(customer) => onChange({ kind: 'existing', customer })}
      onUseOnFile={() => onChange({ kind: 'on-file' })}
      onNew={() => onChange({ kind: 'new' })}
    />
  );
}

function Chosen({
  name,
  detail,
  note,
  onChange,
}: {
  name: string;
  detail: string;
  note?: string;
  onChange: () => void;
}) {
  return (
    <div className="flex flex-wrap items-start justify-between gap-3 rounded-control border-2 border-primary bg-sunken p-4">
      <div className="flex flex-col gap-0.5">
        <span className="flex items-center gap-2 text-lg font-bold">
          <span aria-hidden="true">✓</span>
          {name}
        </span>
        {detail ? <span className="text-sm text-ink-muted">{detail}</span> : null}
        {note ? <span className="text-sm text-ink-muted">{note}</span> : null}
      </div>
      <Button variant="secondary" onClick={onChange}>
        Change customer
      </Button>
    </div>
  );
}

function CustomerSearch({
  onFile,
  onPick,
  onUseOnFile,
  onNew,
}: {
  onFile: Customer | null;
  onPick: (customer: Customer) => void;
  onUseOnFile: () => void;
  onNew: () => void;
}) {
  const [query, setQuery] = useState('');
  const settled = useDebouncedValue(query.trim(), 250);
  const search = useCustomerSearch(settled);
  const results = settled.length >= minCustomerQuery ? (search.data?.customers ?? []) : [];
  const searched =
    settled.length >= minCustomerQuery && search.isSuccess && !search.isPlaceholderData;

  return (
    <div className="flex flex-col gap-4">
      {onFile ? (
        <div>
          <Button variant="secondary" onClick={onUseOnFile}>
            Use {onFile.name} (on file)
          </Button>
        </div>
      ) : null}
      <TextField
        label="Find customer"
        type="search"
        hint="Type two or more letters of the name."
        value={query}
        onChange={(event) => setQuery(event.target.value)}
        // Enter searches; it must not send the new-case form from here.
        onKeyDown={(event) => {
          if (event.key === 'Enter') event.preventDefault();
        }}
        autoComplete="off"
        enterKeyHint="search"
      />
      {search.isError ? (
        <ErrorState
          title="Customers not searched"
          message={search.error.message}
          onRetry={() => void search.refetch()}
          retrying={search.isRefetching}
        />
      ) : search.isFetching && results.length === 0 ? (
        <LoadingState label="Searching customers…" />
      ) : null}
      {results.length > 0 ? (
        <ul className="flex flex-col gap-2" aria-label="Customers on file">
          {results.map((customer) => (
            <li key={customer.id}>
              <button
                type="button"
                onClick={() => onPick(customer)}
                className="flex min-h-touch w-full flex-col items-start rounded-control border-2 border-line-strong bg-surface px-4 py-2 text-left hover:bg-sunken"
              >
                <span className="font-bold">{customer.name}</span>
                {customer.phone || customer.email ? (
                  <span className="text-sm text-ink-muted">
                    {[customer.phone, customer.email].filter(Boolean).join(' · ')}
                  </span>
                ) : null}
              </button>
            </li>
          ))}
        </ul>
      ) : searched ? (
        <p role="status">No customer on file is called “{settled}”.</p>
      ) : null}
      <div>
        <Button variant="secondary" onClick={onNew}>
          New customer
        </Button>
      </div>
    </div>
  );
}
