// What is waiting to be sent and what was saved, right by the step: "3 answers and 1 photo wait
// for the network", "Sending…", "All answers saved", a session to renew before anything is sent,
// and anything the server refused, kept with its words until the person removes it.
import { useState } from 'react';
import type { CompiledTree } from '@heatpath/fault-tree';
import { Alert } from '../../../components/ui/alert';
import { Button, ButtonLink } from '../../../components/ui/button';
import {
  discardOutboxItem,
  isPending,
  outboxSender,
  useOutbox,
  useOutboxStatus,
} from '../../../lib/outbox';
import { useOnline } from '../../../lib/online';
import type { AnswerNotice } from '../hooks/use-local-walk';
import { countItems, describeItem } from '../outbox-words';

interface AnswerStatusProps {
  caseId: string;
  tree: CompiledTree | null;
  notice: AnswerNotice | null;
}

export function AnswerStatus({ caseId, tree, notice }: AnswerStatusProps) {
  const items = useOutbox(caseId);
  const online = useOnline();
  const sender = useOutboxStatus();
  const pending = items.filter(isPending);
  const refused = items.filter((item) => item.state === 'refused');
  const saved = useSavedAfterWaiting(pending.length);
  const counted = countItems(pending);
  const verb = pending.length === 1 ? 'waits' : 'wait';

  return (
    <>
      {notice ? (
        <Alert tone="danger" role="alert" title="Answer not accepted">
          <p>
            “{notice.label}”: {notice.message}
          </p>
        </Alert>
      ) : null}
      {refused.length > 0 ? (
        <Alert tone="danger" role="alert" title="Not accepted by the server">
          <ul className="flex flex-col gap-2">
            {refused.map((item) => (
              <li key={item.seq} className="flex flex-wrap items-center gap-3">
                <span>
                  <span className="font-semibold">{describeItem(item, tree)}</span> — {item.problem}
                </span>
                <Button variant="quiet" onClick={() => void discardOutboxItem(item.seq)}>
                  Remove
                </Button>
              </li>
            ))}
          </ul>
        </Alert>
      ) : null}
      {pending.length === 0 ? (
        saved ? (
          <p role="status" className="flex items-center gap-2 font-semibold text-ok-ink">
            <span aria-hidden="true">✓</span> All answers saved.
          </p>
        ) : null
      ) : sender.signedOut ? (
        <Alert tone="caution" role="alert" title="Sign in again to send">
          <p>
            {counted} {verb} on this tablet. Your session has ended; nothing is lost, and it is sent
            once you sign in again.
          </p>
          <div>
            <ButtonLink to="/sign-in">Sign in</ButtonLink>
          </div>
        </Alert>
      ) : !online || sender.retrying ? (
        <div
          role="status"
          className="flex flex-wrap items-center gap-3 rounded-control bg-sunken p-3"
        >
          <span>
            <span className="font-semibold">
              {counted} {verb} for the network.
            </span>{' '}
            Kept on this tablet and sent by themselves when it is back.
          </span>
          <Button variant="secondary" onClick={() => outboxSender().kick()}>
            Send now
          </Button>
        </div>
      ) : (
        <p role="status" className="rounded-control bg-info-bg p-3 text-info-ink">
          Sending {counted}…
        </p>
      )}
    </>
  );
}

/** True once everything that waited this visit has been saved, until something waits again. */
function useSavedAfterWaiting(pending: number): boolean {
  const [waited, setWaited] = useState(false);
  // Adjusted while rendering (not in an effect): the first render with something waiting marks it.
  if (pending > 0 && !waited) setWaited(true);
  return waited && pending === 0;
}
