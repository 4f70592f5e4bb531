// Page scaffolding: one h1 per screen with an optional lead paragraph and a side action.
import type { ReactNode } from 'react';

interface PageHeaderProps {
  title: string;
  lead?: ReactNode;
  action?: ReactNode;
}

export function PageHeader({ title, lead, action }: PageHeaderProps) {
  return (
    <header className="flex flex-col gap-3 sm:flex-row sm:items-end sm:justify-between">
      <div className="flex max-w-3xl flex-col gap-2">
        <h1 className="text-2xl font-bold">{title}</h1>
        {lead ? <div className="text-ink-muted">{lead}</div> : null}
      </div>
      {action ? <div className="shrink-0">{action}</div> : null}
    </header>
  );
}

export function Panel({
  children,
  className = '',
  labelledBy,
}: {
  children: ReactNode;
  className?: string;
  labelledBy?: string;
}) {
  return (
    <section
      aria-labelledby={labelledBy}
      className={`rounded-panel border-2 border-line bg-surface p-4 sm:p-6 ${className}`}
    >
      {children}
    </section>
  );
}
