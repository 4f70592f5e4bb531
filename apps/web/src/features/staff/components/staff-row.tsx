// One person in the staff table, with the lead's controls: change role, deactivate (after a
// confirmation) or reactivate. The lead's own row has none: the API refuses a lead demoting or
// locking out themself, and offering the button would only produce that refusal.
import { roleLabels, roleSchema, type Role, type StaffMember } from '@heatpath/contracts';
import { useState } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { TableCell, TableRow } from '../../../components/ui/table';
import { useResendInvitation } from '../api/invite-staff-member';
import { useUpdateStaffMember } from '../api/update-staff-member';
import { roleOptions } from './role-options';

interface StaffRowProps {
  member: StaffMember;
  isSelf: boolean;
}

export function StaffRow({ member, isSelf }: StaffRowProps) {
  const update = useUpdateStaffMember();
  const [role, setRole] = useState<Role>(member.role);
  const [confirming, setConfirming] = useState(false);
  const roleChanged = role !== member.role;

  const change = (changes: { role?: Role; active?: boolean }) =>
    update.mutate({ userId: member.id, changes }, { onSuccess: () => setConfirming(false) });

  return (
    <TableRow muted={!member.active}>
      <TableCell header className="md:col-span-2 lg:w-[36%]">
        <span className="block font-semibold">
          {member.name}
          {isSelf ? <span className="font-normal text-ink-muted"> (you)</span> : null}
        </span>
        <span className="block text-sm text-ink-muted [overflow-wrap:anywhere]">
          {member.email}
        </span>
      </TableCell>
      <TableCell label="Role">
        {isSelf || !member.active ? (
          <span>{roleLabels[member.role]}</span>
        ) : (
          <div className="flex flex-wrap items-center gap-2">
            <select
              aria-label={`Role for ${member.name}`}
              value={role}
              onChange={(event) => setRole(roleSchema.parse(event.target.value))}
              className="min-h-touch rounded-control border-2 border-line-strong bg-surface px-3"
            >
              {roleOptions.map((option) => (
                <option key={option.value} value={option.value}>
                  {option.label}
                </option>
              ))}
            </select>
            {roleChanged ? (
              <>
                <Button
                  busy={update.isPending}
                  busyLabel="Saving…"
                  onClick={() => change({ role })}
                >
                  {'Save role '}
                  <span className="sr-only">for {member.name}</span>
                </Button>
                <Button variant="quiet" onClick={() => setRole(member.role)}>
                  {'Undo '}
                  <span className="sr-only">role change for {member.name}</span>
                </Button>
              </>
            ) : null}
          </div>
        )}
      </TableCell>
      <TableCell label="Status">
        <div className="flex flex-wrap gap-2">
          {member.active ? <Badge tone="ok">Active</Badge> : <Badge>Deactivated</Badge>}
          {member.invitationPending ? (
            <Badge tone="caution">
              <span aria-hidden="true">✉&nbsp;</span>Invited, no password yet
            </Badge>
          ) : null}
        </div>
      </TableCell>
      <TableCell label="Access" className="md:col-span-2">
        <div className="flex flex-col gap-3">
          {isSelf ? (
            <span className="text-sm text-ink-muted">Another lead can change your access.</span>
          ) : member.active ? (
            confirming ? (
              <div
                className="flex flex-col gap-2"
                role="group"
                aria-label={`Confirm deactivating ${member.name}`}
              >
                <p className="text-sm">
                  {member.name} will not be able to sign in. Their past work stays in Heatpath.
                </p>
                <div className="flex flex-wrap gap-2">
                  <Button
                    variant="danger"
                    busy={update.isPending}
                    busyLabel="Deactivating…"
                    onClick={() => change({ active: false })}
                  >
                    {'Yes, deactivate '}
                    <span className="sr-only">{member.name}</span>
                  </Button>
                  <Button variant="secondary" onClick={() => setConfirming(false)}>
                    Keep active
                  </Button>
                </div>
              </div>
            ) : (
              <Button variant="secondary" onClick={() => setConfirming(true)}>
                {'Deactivate '}
                <span className="sr-only">{member.name}</span>
              </Button>
            )
          ) : (
            <Button
              variant="secondary"
              busy={update.isPending}
              busyLabel="Reactivating…"
              onClick={() => change({ active: true })}
            >
              {'Reactivate '}
              <span className="sr-only">{member.name}</span>
            </Button>
          )}
          {member.invitationPending && member.active && !isSelf ? (
            <ResendInvitation member={member} />
          ) : null}
          {update.error ? (
            <Alert tone="danger" role="alert" title="Not changed">
              <p>{update.error.message}</p>
            </Alert>
          ) : null}
        </div>
      </TableCell>
    </TableRow>
  );
}

/** A fresh invitation link for someone who has not set a password; the old link stops working. */
function ResendInvitation({ member }: { member: StaffMember }) {
  const resend = useResendInvitation();
  return (
    <div className="flex flex-col gap-2">
      <Button
        variant="secondary"
        busy={resend.isPending}
        busyLabel="Sending…"
        onClick={() => resend.mutate(member.id)}
      >
        {'Send invitation again '}
        <span className="sr-only">to {member.name}</span>
      </Button>
      {resend.isSuccess ? (
        <p role="status" className="text-sm font-semibold text-ok-ink">
          <span aria-hidden="true">✓ </span>A new link is in the outbox; the old one no longer
          works.
        </p>
      ) : null}
      {resend.error ? (
        <p role="alert" className="text-sm font-semibold text-danger-ink">
          {resend.error.message}
        </p>
      ) : null}
    </div>
  );
}
