// The case list: filters above, one large tappable card per case, and "Load more" for the next
// keyset page. Filters are owned by the caller (the route keeps them in the address), so a
// reload or a shared link shows the same list.
import { caseStatuses, type CaseStatus, type CaseSummary } from '@heatpath/contracts';
import { useEffect, useState } from 'react';
import { Link } from 'react-router';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/field';
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useCases, type CaseListFilters } from '../api/get-cases';
import { formatDateTime, statusLabel, vehicleName, vehicleTag } from '../case-format';
import { CaseStatusBadge } from './case-status-badge';

export interface PersonOption {
  id: string;
  name: string;
}

interface CaseListProps {
  filters: CaseListFilters;
  onFiltersChange: (filters: CaseListFilters) => void;
  /** Offer "My cases" / "Whole workshop". */
  showScope?: boolean;
  /** Offer the status filter. */
  showStatus?: boolean;
  /** People a lead can filter by; absent for everyone else. */
  technicians?: readonly PersonOption[] | undefined;
  /** What an empty list says when no filter or search narrows it. */
  emptyText: string;
}

const anyValue = '';

export function CaseList({
  filters,
  onFiltersChange,
  showScope = true,
  showStatus = true,
  technicians,
  emptyText,
}: CaseListProps) {
  // The box keeps its own text, so no key is lost while the address catches up; the server is
  // asked, and the address updated, once the typing pauses.
  const addressQ = filters.q ?? '';
  const [text, setText] = useState(addressQ);
  const settledQ = useDebouncedValue(text.trim(), 350);
  const [seenAddressQ, setSeenAddressQ] = useState(addressQ);
  if (addressQ !== seenAddressQ) {
    setSeenAddressQ(addressQ);
    // Changed from outside (back button, a link), not by this box: show it.
    if (addressQ !== settledQ) setText(addressQ);
  }
  useEffect(() => {
    if (settledQ === text.trim() && settledQ !== addressQ) {
      onFiltersChange({ ...filters, q: settledQ || undefined });
    }
  }, [settledQ, text, addressQ, filters, onFiltersChange]);
  const cases = useCases({ ...filters, q: settledQ || undefined });

  const rows = cases.data?.pages.flatMap((page) => page.cases) ?? [];
  const narrowed = Boolean(settledQ || filters.status || filters.technicianId);

  return (
    <div className="flex flex-col gap-5">
      <div className="flex flex-wrap items-end gap-4">
        <div className="min-w-56 flex-[2_1_14rem]">
          <TextField
            label="Search cases"
            type="search"
            value={text}
            onChange={(event) => setText(event.target.value)}
            placeholder="Plate, VIN or customer"
            className="placeholder:text-ink-muted"
            autoComplete="off"
            spellCheck={false}
            enterKeyHint="search"
          />
        </div>
        {showScope ? (
          <div className="shrink-0 [&_label]:whitespace-nowrap">
            <SegmentedChoice
              legend="Show"
              value={filters.scope}
              choices={[
                { value: 'mine', label: 'My cases' },
                { value: 'workshop', label: 'Whole workshop' },
              ]}
              onChange={(scope) => onFiltersChange({ ...filters, scope })}
            />
          </div>
        ) : null}
        {showStatus ? (
          <div className="min-w-44 flex-[1_1_10rem]">
            <SelectField
              label="Status"
              value={filters.status ?? anyValue}
              onChange={(event) =>
                onFiltersChange({
                  ...filters,
                  status: caseStatuses.find((status) => status === event.target.value),
                })
              }
              options={[
                { value: anyValue, label: 'Any status' },
                ...caseStatuses.map((status) => ({ value: status, label: statusLabel(status) })),
              ]}
            />
          </div>
        ) : null}
        {technicians ? (
          <div className="min-w-44 flex-[1_1_10rem]">
            <SelectField
              label="Technician"
              value={filters.technicianId ?? anyValue}
              onChange={(event) =>
                onFiltersChange({ ...filters, technicianId: event.target.value || undefined })
              }
              options={[
                { value: anyValue, label: 'Anyone' },
                ...technicians.map((person) => ({ value: person.id, label: person.name })),
              ]}
            />
          </div>
        ) : null}
      </div>

      {cases.isPending ? (
        <LoadingState label="Loading cases…" />
      ) : cases.isError && rows.length === 0 ? (
        <ErrorState
          title="Cases not loaded"
          message={cases.error.message}
          onRetry={() => void cases.refetch()}
          retrying={cases.isRefetching}
        />
      ) : rows.length === 0 ? (
        <div className="rounded-panel border-2 border-line bg-surface p-4 sm:p-6">
          <p className="font-semibold">{narrowed ? 'No case matches.' : emptyText}</p>
          {narrowed ? (
            <p className="text-ink-muted">Check the spelling, or clear the search and filters.</p>
          ) : null}
        </div>
      ) : (
        <>
          <p className="sr-only" role="status">
            {rows.length} {rows.length === 1 ? 'case' : 'cases'} shown
          </p>
          <ul className="flex flex-col gap-3" aria-label="Cases">
            {rows.map((summary) => (
              <li key={summary.id}>
                <CaseRow summary={summary} />
              </li>
            ))}
          </ul>
          {cases.hasNextPage ? (
            <div>
              <Button
                variant="secondary"
                onClick={() => void cases.fetchNextPage()}
                busy={cases.isFetchingNextPage}
                busyLabel="Loading more…"
              >
                Load more
              </Button>
            </div>
          ) : null}
          {cases.isFetchNextPageError ? (
            <ErrorState
              title="More cases not loaded"
              message={cases.error?.message ?? ''}
              onRetry={() => void cases.fetchNextPage()}
              retrying={cases.isFetchingNextPage}
            />
          ) : null}
        </>
      )}
    </div>
  );
}

function CaseRow({ summary }: { summary: CaseSummary }) {
  return (
    <Link
      to={`/cases/${summary.id}`}
      className={
        'grid min-h-touch gap-x-6 gap-y-2 rounded-panel border-2 border-line-strong bg-surface p-4 ' +
        'hover:bg-sunken lg:grid-cols-[15rem_1fr_15rem] lg:items-start'
      }
    >
      <span className="flex flex-col gap-1">
        <span className="flex flex-wrap items-center gap-x-3 gap-y-1">
          <span className="text-lg font-bold">{vehicleTag(summary.vehicle)}</span>
          <span className="text-sm text-ink-muted">{summary.reference}</span>
        </span>
        <span>{vehicleName(summary.vehicle)}</span>
        {summary.customerName ? (
          <span className="text-sm text-ink-muted">{summary.customerName}</span>
        ) : null}
      </span>
      <span className="flex flex-col gap-1">
        <span className="line-clamp-2">“{summary.complaint}”</span>
        {summary.currentStepTitle && summary.status !== 'diagnosed' ? (
          <span className="text-sm">
            <span className="font-semibold">Now: </span>
            {summary.currentStepTitle}
          </span>
        ) : null}
      </span>
      <span className="flex flex-col items-start gap-1 lg:items-end lg:text-right">
        <CaseStatusBadge status={summary.status} />
        <span className="text-sm text-ink-muted">
          {summary.assignee ? summary.assignee.name : 'Not assigned'}
        </span>
        <span className="text-sm text-ink-muted">Opened {formatDateTime(summary.createdAt)}</span>
      </span>
    </Link>
  );
}

export function isCaseStatus(value: string | null): value is CaseStatus {
  return caseStatuses.some((status) => status === value);
}
