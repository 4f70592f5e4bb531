// The lead's staff screen body: who works here, an invitation by e-mail, and a form to add
// someone with a first password.
import { Panel } from '../../../components/ui/page';
import { ErrorState, LoadingState } from '../../../components/ui/status';
import { Table, TableBody, TableHead, TableHeaderCell } from '../../../components/ui/table';
import { useMe } from '../../../lib/auth';
import { useStaff } from '../api/get-staff';
import { AddStaffForm } from './add-staff-form';
import { InviteStaffForm } from './invite-staff-form';
import { StaffRow } from './staff-row';

export function StaffDirectory() {
  const me = useMe();
  const staff = useStaff();

  // Active people first, then by name, so the list reads like the rota.
  const members = [...(staff.data?.staff ?? [])].sort(
    (a, b) => Number(b.active) - Number(a.active) || a.name.localeCompare(b.name),
  );

  return (
    <div className="flex flex-col gap-6">
      <Panel labelledBy="staff-list-heading">
        <h2 id="staff-list-heading" className="mb-4 text-xl font-bold">
          People in {me.workshop.name}
        </h2>
        {staff.isPending ? (
          <LoadingState label="Loading staff…" />
        ) : staff.isError ? (
          <ErrorState
            title="Staff list not loaded"
            message={staff.error.message}
            onRetry={() => void staff.refetch()}
            retrying={staff.isRefetching}
          />
        ) : (
          <Table caption={`Staff of ${me.workshop.name}`}>
            <TableHead>
              <TableHeaderCell>Name</TableHeaderCell>
              <TableHeaderCell>Role</TableHeaderCell>
              <TableHeaderCell>Status</TableHeaderCell>
              <TableHeaderCell>Access</TableHeaderCell>
            </TableHead>
            <TableBody>
              {members.map((member) => (
                <StaffRow
                  // Keyed on what the server says, so an unsaved choice resets once it changes.
                  key={`${member.id}:${member.role}:${String(member.active)}`}
                  member={member}
                  isSelf={member.id === me.id}
                />
              ))}
            </TableBody>
          </Table>
        )}
      </Panel>
      <Panel>
        <InviteStaffForm />
      </Panel>
      <Panel>
        <AddStaffForm />
      </Panel>
    </div>
  );
}
