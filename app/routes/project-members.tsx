// /projects/:projectId/members: who works on the project; owners manage roles and membership.
import { useQueryClient } from '@tanstack/react-query';
import { roleAllows } from '../../shared/api/roles';
import { ErrorPanel, Loading } from '../components/ui/status';
import { useSignedInUser } from '../features/auth/hooks/use-signed-in-user';
import { useMembers } from '../features/members/api/get-members';
import { InviteForm } from '../features/invitations/components/invite-form';
import { PendingInvitations } from '../features/invitations/components/pending-invitations';
import { AddMemberForm } from '../features/members/components/add-member-form';
import { MemberList } from '../features/members/components/member-list';
import { projectsQueryKey } from '../features/projects/api/get-projects';
import { useDocumentTitle } from '../hooks/use-document-title';
import { useProjectFromLayout } from './project-layout';

export function ProjectMembersRoute() {
  const project = useProjectFromLayout();
  useDocumentTitle(`Members — ${project.name}`);
  const user = useSignedInUser();
  const members = useMembers(project.id);
  const queryClient = useQueryClient();
  const canManage = roleAllows(project.role, 'manage');

  return (
    <div className="space-y-8">
      <section aria-labelledby="members-title" className="space-y-4">
        <h2 id="members-title" className="text-lg font-semibold">
          Members
        </h2>
        {!canManage && (
          <p className="text-sm text-stone-600">
            Only the project’s owners can add people or change roles.
          </p>
        )}
        {members.isPending ? (
          <Loading label="Loading members…" />
        ) : members.isError ? (
          <ErrorPanel error={members.error} onRetry={() => void members.refetch()} />
        ) : (
          <MemberList
            projectId={project.id}
            members={members.data}
            currentUserId={user.id}
            canManage={canManage}
            onOwnMembershipChanged={() =>
              void queryClient.invalidateQueries({ queryKey: projectsQueryKey })
            }
          />
        )}
      </section>
      {canManage && (
        <section
          aria-labelledby="invite-title"
          className="space-y-4 rounded-xl border border-stone-200 bg-white p-6"
        >
          <h2 id="invite-title" className="text-lg font-semibold">
            Invite by e-mail
          </h2>
          <InviteForm projectId={project.id} />
          <h3 className="pt-2 text-base font-semibold">Waiting for an answer</h3>
          <PendingInvitations projectId={project.id} />
        </section>
      )}
      {canManage && (
        <section
          aria-labelledby="add-member-title"
          className="rounded-xl border border-stone-200 bg-white p-6"
        >
          <h2 id="add-member-title" className="mb-4 text-lg font-semibold">
            Add a member
          </h2>
          <AddMemberForm projectId={project.id} />
        </section>
      )}
    </div>
  );
}
