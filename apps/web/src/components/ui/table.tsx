// A data table that is a real table on a wide screen and a stack of cards on a phone. The table
// roles are set explicitly because browsers drop them from the accessibility tree once a table's
// display is changed for the narrow layout.
import type { ReactNode } from 'react';

export function Table({ caption, children }: { caption: string; children: ReactNode }) {
  return (
    <table role="table" className="block w-full border-collapse lg:table">
      <caption className="sr-only">{caption}</caption>
      {children}
    </table>
  );
}

export function TableHead({ children }: { children: ReactNode }) {
  return (
    <thead role="rowgroup" className="sr-only lg:not-sr-only lg:table-header-group">
      <tr role="row" className="border-b-2 border-line-strong">
        {children}
      </tr>
    </thead>
  );
}

export function TableHeaderCell({ children }: { children: ReactNode }) {
  return (
    <th role="columnheader" scope="col" className="px-3 py-2 text-left text-sm font-semibold">
      {children}
    </th>
  );
}

export function TableBody({ children }: { children: ReactNode }) {
  return (
    <tbody role="rowgroup" className="flex flex-col gap-3 lg:table-row-group">
      {children}
    </tbody>
  );
}

export function TableRow({ children, muted = false }: { children: ReactNode; muted?: boolean }) {
  return (
    <tr
      role="row"
      className={
        // Phone: a stacked card. Portrait tablet: a two-column card. Landscape: a table row.
        'flex flex-col gap-3 rounded-panel border-2 border-line p-4 md:grid md:grid-cols-2 ' +
        'md:gap-x-6 lg:table-row lg:rounded-none ' +
        'lg:border-0 lg:border-b lg:p-0 ' +
        (muted ? 'bg-sunken' : 'bg-surface')
      }
    >
      {children}
    </tr>
  );
}

interface TableCellProps {
  /** Shown before the value in the stacked phone layout, where the column header is hidden. */
  label?: string;
  header?: boolean;
  /** Extra classes, e.g. a column width for the wide layout. */
  className?: string;
  children: ReactNode;
}

export function TableCell({ label, header = false, className = '', children }: TableCellProps) {
  const content = (
    <>
      {label ? (
        <span aria-hidden="true" className="block text-sm font-semibold text-ink-muted lg:hidden">
          {label}
        </span>
      ) : null}
      {children}
    </>
  );
  const classes = `block align-middle lg:table-cell lg:px-3 lg:py-3 ${className}`;
  return header ? (
    <th role="rowheader" scope="row" className={`${classes} text-left font-normal`}>
      {content}
    </th>
  ) : (
    <td role="cell" className={classes}>
      {content}
    </td>
  );
}
