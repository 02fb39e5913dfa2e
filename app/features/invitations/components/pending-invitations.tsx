// The invitations nobody has accepted yet: resend (a new link, a new expiry) or withdraw them.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { roleName } from '../../../components/ui/role-badge';
import { ErrorPanel, FormAlert, Loading, SavedNote } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import { cn } from '../../../utils/cn';
import type { Invitation } from '../../../../shared/api/schemas';
import { useInvitations } from '../api/get-invitations';
import { useResendInvitation } from '../api/resend-invitation';
import { useWithdrawInvitation } from '../api/withdraw-invitation';
import { describeExpiry, openInvitations } from '../utils/open-invitations';

export function PendingInvitations({ projectId }: { projectId: number }) {
  const invitations = useInvitations(projectId);
  const resend = useResendInvitation(projectId);
  const withdraw = useWithdrawInvitation(projectId);
  const [withdrawing, setWithdrawing] = useState<Invitation | null>(null);

  if (invitations.isPending) return <Loading label="Loading invitations…" />;
  if (invitations.isError)
    return <ErrorPanel error={invitations.error} onRetry={() => void invitations.refetch()} />;

  const open = openInvitations(invitations.data);
  if (open.length === 0)
    return <p className="text-sm text-stone-600">No invitations are waiting for an answer.</p>;
  const now = new Date();

  return (
    <div className="space-y-3">
      <FormAlert message={formErrorMessage(resend.error)} />
      {resend.isSuccess && <SavedNote>A new link was sent to {resend.data.email}.</SavedNote>}
      <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Invitations waiting for an answer</caption>
          <thead className="border-b border-stone-200 bg-stone-50 text-left text-stone-700">
            <tr>
              <th scope="col" className="px-3 py-2 font-semibold">
                E-mail
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Role
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Invited by
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Link
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {open.map((invitation) => (
              <tr key={invitation.id} className="border-b border-stone-100 last:border-0">
                <th scope="row" className="px-3 py-2 text-left font-semibold">
                  {invitation.email}
                </th>
                <td className="px-3 py-2">{roleName(invitation.role)}</td>
                <td className="px-3 py-2 text-stone-700">{invitation.invitedBy}</td>
                <td
                  className={cn(
                    'px-3 py-2',
                    invitation.status === 'expired' ? 'font-semibold text-red-800' : 'text-stone-700',
                  )}
                >
                  {describeExpiry(invitation.expiresAt, now)}
                </td>
                <td className="px-3 py-2 text-right whitespace-nowrap">
                  <Button
                    size="sm"
                    busy={resend.isPending && resend.variables === invitation.id}
                    onClick={() => {
                      withdraw.reset();
                      resend.mutate(invitation.id);
                    }}
                  >
                    Resend<span className="sr-only"> the invitation of {invitation.email}</span>
                  </Button>{' '}
                  <Button
                    size="sm"
                    variant="danger"
                    onClick={() => {
                      resend.reset();
                      withdraw.reset();
                      setWithdrawing(invitation);
                    }}
                  >
                    Withdraw<span className="sr-only"> the invitation of {invitation.email}</span>
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <Dialog
        open={withdrawing !== null}
        onClose={() => setWithdrawing(null)}
        title={withdrawing ? `Withdraw the invitation of ${withdrawing.email}?` : 'Withdraw invitation'}
        description="The link in their e-mail stops working. You can invite them again later."
      >
        <FormAlert message={formErrorMessage(withdraw.error)} />
        <div className="flex justify-end gap-2">
          <Button onClick={() => setWithdrawing(null)}>Cancel</Button>
          <Button
            variant="danger"
            busy={withdraw.isPending}
            onClick={() =>
              withdrawing &&
              withdraw.mutate(withdrawing.id, { onSuccess: () => setWithdrawing(null) })
            }
          >
            {withdraw.isPending ? 'Withdrawing…' : 'Withdraw'}
          </Button>
        </div>
      </Dialog>
    </div>
  );
}
