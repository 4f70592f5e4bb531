// E-mailing the approved repair order, PDF attached: to the customer on file, to the advisor
// themself, or to another address. Every message goes to the outbox first; its status below
// follows the worker (waiting, delivered, or what went wrong).
import {
  sendRepairOrderRequestSchema,
  type RepairOrderReview,
  type SendRepairOrderRequest,
} from '@heatpath/contracts';
import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { useMe } from '../../../lib/auth';
import { useSendRepairOrder } from '../api/send-repair-order';
import { formatDateTime, sendStatusLabel, sendStatusMarks, sendStatusTones } from '../format';

type Audience = SendRepairOrderRequest['audience'];

export function SendPanel({ review, dirty }: { review: RepairOrderReview; dirty: boolean }) {
  const me = useMe();
  const send = useSendRepairOrder();
  const customerEmail = review.customer?.email ?? null;
  const [audience, setAudience] = useState<Audience>(customerEmail ? 'customer' : 'advisor');
  const [name, setName] = useState('');
  const [address, setAddress] = useState('');
  const [note, setNote] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [sentTo, setSentTo] = useState<string | null>(null);
  const revision = review.approvedRevision;

  const recipient =
    audience === 'customer'
      ? { name: review.customer?.name, address: customerEmail ?? '' }
      : audience === 'advisor'
        ? { name: me.name, address: me.email }
        : { name: name.trim() || undefined, address };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (revision === null) return;
    setSentTo(null);
    const parsed = sendRepairOrderRequestSchema.safeParse({
      revision,
      to: recipient,
      audience,
      note: note.trim() || undefined,
    });
    if (!parsed.success) {
      const next: Record<string, string> = {};
      for (const issue of parsed.error.issues) next[issue.path.join('.')] ??= issue.message;
      setErrors(next);
      return;
    }
    setErrors({});
    send.mutate(
      { caseId: review.caseId, ...parsed.data },
      {
        onSuccess: (sent) => {
          setSentTo(sent.to.map((to) => to.address).join(', '));
          setNote('');
        },
        onError: () => undefined,
      },
    );
  };

  const choices: { value: Audience; label: string; detail: string; disabled?: boolean }[] = [
    {
      value: 'customer',
      label: 'Customer',
      detail: review.customer
        ? `${review.customer.name}, ${customerEmail ?? 'no e-mail address on file'}`
        : 'No customer on this case',
      disabled: !customerEmail,
    },
    { value: 'advisor', label: 'Me', detail: `${me.name}, ${me.email}` },
    { value: 'other', label: 'Another address', detail: 'Type the name and address below' },
  ];

  return (
    <section
      aria-labelledby="send-heading"
      className="flex flex-col gap-4 rounded-panel border-2 border-line bg-surface p-4 sm:p-6"
    >
      <h2 id="send-heading" className="text-xl font-bold">
        Send by e-mail
      </h2>
      {revision === null || !review.can.send ? (
        <p className="text-ink-muted">Approve a revision to send it with its PDF.</p>
      ) : (
        <form
          onSubmit={submit}
          noValidate
          aria-label="Send the repair order"
          className="flex flex-col gap-4"
        >
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-1 font-semibold">Send revision {revision} to</legend>
            {choices.map((choice) => (
              <label
                key={choice.value}
                className={
                  'flex min-h-touch cursor-pointer items-start gap-3 rounded-control border-2 p-3 ' +
                  'has-focus-visible:outline-3 has-focus-visible:outline-focus ' +
                  (audience === choice.value ? 'border-primary bg-sunken' : 'border-line-strong') +
                  (choice.disabled ? ' cursor-not-allowed opacity-60' : '')
                }
              >
                <input
                  type="radio"
                  name="audience"
                  value={choice.value}
                  checked={audience === choice.value}
                  disabled={choice.disabled}
                  onChange={() => setAudience(choice.value)}
                  className="mt-1 size-5 shrink-0 accent-primary"
                />
                <span className="flex min-w-0 flex-col">
                  <span className="font-semibold">{choice.label}</span>
                  <span className="text-sm text-ink-muted [overflow-wrap:anywhere]">
                    {choice.detail}
                  </span>
                </span>
              </label>
            ))}
          </fieldset>
          {audience === 'other' ? (
            <div className="grid gap-4">
              <TextField
                label="Recipient’s name"
                autoComplete="off"
                value={name}
                onChange={(e) => setName(e.target.value)}
                error={errors['to.name']}
              />
              <TextField
                label="E-mail address"
                type="email"
                inputMode="email"
                autoCapitalize="none"
                spellCheck={false}
                value={address}
                onChange={(e) => setAddress(e.target.value)}
                error={errors['to.address']}
              />
            </div>
          ) : errors['to.address'] ? (
            <Alert tone="danger" role="alert" title="Cannot send there">
              <p>{errors['to.address']}</p>
            </Alert>
          ) : null}
          <TextAreaField
            label="A line of your own (optional)"
            hint="Goes above the findings in the e-mail."
            rows={2}
            value={note}
            onChange={(e) => setNote(e.target.value)}
            error={errors.note}
          />
          {send.error ? (
            <Alert tone="danger" role="alert" title="Not sent">
              <p>{send.error.message}</p>
            </Alert>
          ) : null}
          {sentTo ? (
            <Alert tone="ok" role="status" title="In the outbox">
              <p className="[overflow-wrap:anywhere]">
                Going to {sentTo}. The status below changes once the mail server has it.
              </p>
            </Alert>
          ) : null}
          <div>
            <Button
              type="submit"
              size="large"
              busy={send.isPending}
              busyLabel="Sending…"
              disabled={dirty}
              aria-describedby={dirty ? 'send-hint' : undefined}
            >
              Send repair order
            </Button>
            {dirty ? (
              <p id="send-hint" className="mt-2 text-sm text-ink-muted">
                You have unsaved edits; the e-mail carries approved revision {revision}. Save or
                undo them first.
              </p>
            ) : null}
          </div>
        </form>
      )}
      {review.sends.length > 0 ? (
        <div className="flex flex-col gap-2 border-t-2 border-line pt-4">
          <h3 className="text-lg font-bold">Sent</h3>
          <ul aria-label="Sent repair orders" className="flex flex-col gap-3">
            {review.sends.map((s) => (
              <li key={s.id} className="flex flex-col gap-1">
                <p className="flex flex-wrap items-center gap-2">
                  <Badge tone={sendStatusTones[s.status]}>
                    <span aria-hidden="true">{sendStatusMarks[s.status]}&nbsp;</span>
                    {sendStatusLabel(s.status)}
                  </Badge>
                  <span className="[overflow-wrap:anywhere]">
                    {s.to.map((to) => to.address).join(', ')}
                  </span>
                </p>
                <p className="text-sm text-ink-muted">
                  Revision {s.revision}, by {s.sentBy?.name ?? 'someone'}{' '}
                  {formatDateTime(s.createdAt)}
                  {s.sentAt ? `; delivered ${formatDateTime(s.sentAt)}` : ''}
                  {s.attempts > 1 ? `; ${s.attempts} attempts` : ''}.
                </p>
                {s.lastError && s.status !== 'sent' ? (
                  <p className="text-sm font-semibold text-danger-ink">
                    <span aria-hidden="true">✕ </span>
                    {s.lastError}
                    {s.status === 'queued' ? ' Heatpath tries again by itself.' : ''}
                  </p>
                ) : null}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
