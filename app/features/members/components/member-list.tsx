// The members of a project. Owners change roles and remove people here; everyone else reads.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { RoleBadge, roleName } from '../../../components/ui/role-badge';
import { FormAlert } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import { projectRoles, type ProjectRole } from '../../../../shared/api/roles';
import type { Member } from '../../../../shared/api/schemas';
import { useChangeMemberRole } from '../api/change-member-role';
import { useRemoveMember } from '../api/remove-member';

interface MemberListProps {
  projectId: number;
  members: Member[];
  currentUserId: number;
  canManage: boolean;
  /** Called after the signed-in user's own membership changed (their role in the project may differ now). */
  onOwnMembershipChanged: () => void;
}

export function MemberList({
  projectId,
  members,
  currentUserId,
  canManage,
  onOwnMembershipChanged,
}: MemberListProps) {
  const changeRole = useChangeMemberRole(projectId);
  const removeMember = useRemoveMember(projectId);
  const [removing, setRemoving] = useState<Member | null>(null);
  const lastError = removeMember.error ?? changeRole.error;

  const sorted = [...members].sort(
    (a, b) =>
      projectRoles.indexOf(a.role) - projectRoles.indexOf(b.role) ||
      a.name.localeCompare(b.name, 'en-GB'),
  );

  function setRole(member: Member, role: ProjectRole) {
    removeMember.reset();
    changeRole.mutate(
      { userId: member.userId, role },
      { onSuccess: () => member.userId === currentUserId && onOwnMembershipChanged() },
    );
  }

  return (
    <div className="space-y-3">
      {!removing && <FormAlert message={formErrorMessage(lastError)} />}
      <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Project members and their roles</caption>
          <thead className="border-b border-stone-200 bg-stone-50 text-left text-stone-700">
            <tr>
              <th scope="col" className="px-3 py-2 font-semibold">
                Name
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                E-mail
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Role
              </th>
              {canManage && (
                <th scope="col" className="px-3 py-2 font-semibold">
                  <span className="sr-only">Actions</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {sorted.map((member) => {
              const you = member.userId === currentUserId;
              return (
                <tr key={member.userId} className="border-b border-stone-100 last:border-0">
                  <th scope="row" className="px-3 py-2 text-left font-semibold">
                    {member.name}
                    {you && <span className="ml-2 text-xs font-normal text-stone-600">(you)</span>}
                  </th>
                  <td className="px-3 py-2 text-stone-700">{member.email}</td>
                  <td className="px-3 py-2">
                    {canManage ? (
                      <select
                        aria-label={`Role of ${member.name}`}
                        value={member.role}
                        disabled={changeRole.isPending}
                        onChange={(e) => setRole(member, e.target.value as ProjectRole)}
                        className="rounded-md border border-stone-300 bg-white px-2 py-1"
                      >
                        {projectRoles.map((role) => (
                          <option key={role} value={role}>
                            {roleName(role)}
                          </option>
                        ))}
                      </select>
                    ) : (
                      <RoleBadge role={member.role} />
                    )}
                  </td>
                  {canManage && (
                    <td className="px-3 py-2 text-right">
                      <Button
                        size="sm"
                        variant="danger"
                        onClick={() => {
                          removeMember.reset();
                          changeRole.reset();
                          setRemoving(member);
                        }}
                      >
                        Remove<span className="sr-only"> {member.name}</span>
                      </Button>
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <Dialog
        open={removing !== null}
        onClose={() => setRemoving(null)}
        title={removing ? `Remove ${removing.name}?` : 'Remove member'}
        description={
          removing?.userId === currentUserId
            ? 'You will lose access to this project straight away.'
            : 'They will lose access to this project. Their past revisions and comments stay.'
        }
      >
        <FormAlert message={formErrorMessage(removeMember.error)} />
        <div className="flex justify-end gap-2">
          <Button onClick={() => setRemoving(null)}>Cancel</Button>
          <Button
            variant="danger"
            busy={removeMember.isPending}
            onClick={() =>
              removing &&
              removeMember.mutate(removing.userId, {
                onSuccess: () => {
                  const self = removing.userId === currentUserId;
                  setRemoving(null);
                  if (self) onOwnMembershipChanged();
                },
              })
            }
          >
            {removeMember.isPending ? 'Removing…' : 'Remove'}
          </Button>
        </div>
      </Dialog>
    </div>
  );
}
