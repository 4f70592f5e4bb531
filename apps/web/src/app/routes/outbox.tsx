// /outbox: the lead sees every e-mail Heatpath wrote, as its recipient gets it, with its status.
import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { PageHeader } from '../../components/ui/page';
import { outboxQueryOptions } from '../../features/outbox/api/get-outbox';
import { OutboxList } from '../../features/outbox/components/outbox-list';
import { useDocumentTitle } from '../../lib/document-title';
import { requireArea } from '../guards';

export function outboxLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    await requireArea(queryClient, request, 'outbox');
    void queryClient.prefetchInfiniteQuery(outboxQueryOptions());
    return null;
  };
}

export function OutboxRoute() {
  useDocumentTitle('Outbox');
  return (
    <div className="flex flex-col gap-6">
      <PageHeader
        title="Outbox"
        lead="Every e-mail Heatpath has written for this workshop, newest first, exactly as its recipient reads it. A message waits here while the mail server is away and goes out once it is back."
      />
      <OutboxList />
    </div>
  );
}
