// Every account on the site for its administrators: site role, projects, whether it may sign in.
// Disabling asks first, because it signs the person out everywhere.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { TextField } from '../../../components/ui/form-field';
import { ErrorPanel, FormAlert, Loading } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import { formatDate } from '../../../utils/format-date';
import type { AdminUser } from '../../../../shared/api/schemas';
import { useUsers } from '../api/get-users';
import { useUpdateUser } from '../api/update-user';
import { filterUsers, sortUsers } from '../utils/sort-users';

export function UserList({ currentUserId }: { currentUserId: number }) {
  const users = useUsers();
  const update = useUpdateUser();
  const [text, setText] = useState('');
  const [disabling, setDisabling] = useState<AdminUser | null>(null);

  if (users.isPending) return <Loading label="Loading accounts…" />;
  if (users.isError) return <ErrorPanel error={users.error} onRetry={() => void users.refetch()} />;

  const shown = filterUsers(sortUsers(users.data), text);
  const busyFor = (id: number) => update.isPending && update.variables.userId === id;

  return (
    <div className="space-y-4">
      <TextField
        label="Find an account"
        type="search"
        name="find"
        value={text}
        onChange={(e) => setText(e.target.value)}
        hint={`${users.data.length} accounts on this site.`}
        className="max-w-sm"
      />
      {!disabling && <FormAlert message={formErrorMessage(update.error)} />}
      <div className="overflow-x-auto rounded-xl border border-stone-200 bg-white">
        <table className="w-full border-collapse text-sm">
          <caption className="sr-only">Accounts on this site</caption>
          <thead className="border-b border-stone-200 bg-stone-50 text-left text-stone-700">
            <tr>
              <th scope="col" className="px-3 py-2 font-semibold">
                Name
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                E-mail
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Site role
              </th>
              <th scope="col" className="px-3 py-2 text-right font-semibold">
                Projects
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                Since
              </th>
              <th scope="col" className="px-3 py-2 font-semibold">
                <span className="sr-only">Actions</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {shown.map((user) => {
              const you = user.id === currentUserId;
              return (
                <tr
                  key={user.id}
                  className={`border-b border-stone-100 last:border-0 ${user.disabled ? 'text-stone-500' : ''}`}
                >
                  <th scope="row" className="px-3 py-2 text-left font-semibold">
                    {user.name}
                    {you && <span className="ml-2 text-xs font-normal text-stone-600">(you)</span>}
                    {user.disabled && (
                      <span className="ml-2 rounded-full bg-stone-200 px-2 py-0.5 text-xs font-semibold text-stone-700">
                        Disabled
                      </span>
                    )}
                  </th>
                  <td className="px-3 py-2">{user.email}</td>
                  <td className="px-3 py-2">{user.isAdmin ? 'Administrator' : 'Member'}</td>
                  <td className="px-3 py-2 text-right tabular-nums">{user.projects}</td>
                  <td className="px-3 py-2 whitespace-nowrap">{formatDate(user.createdAt)}</td>
                  <td className="px-3 py-2 text-right whitespace-nowrap">
                    {you ? (
                      <span className="text-xs text-stone-600">Your own account</span>
                    ) : (
                      <>
                        <Button
                          size="sm"
                          busy={busyFor(user.id)}
                          onClick={() =>
                            update.mutate({ userId: user.id, change: { isAdmin: !user.isAdmin } })
                          }
                        >
                          {user.isAdmin ? 'Remove administrator' : 'Make administrator'}
                          <span className="sr-only"> {user.name}</span>
                        </Button>{' '}
                        {user.disabled ? (
                          <Button
                            size="sm"
                            busy={busyFor(user.id)}
                            onClick={() =>
                              update.mutate({ userId: user.id, change: { disabled: false } })
                            }
                          >
                            Enable<span className="sr-only"> {user.name}</span>
                          </Button>
                        ) : (
                          <Button
                            size="sm"
                            variant="danger"
                            onClick={() => {
                              update.reset();
                              setDisabling(user);
                            }}
                          >
                            Disable<span className="sr-only"> {user.name}</span>
                          </Button>
                        )}
                      </>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {shown.length === 0 && <p className="text-sm text-stone-600">No account matches “{text}”.</p>}
      <Dialog
        open={disabling !== null}
        onClose={() => setDisabling(null)}
        title={disabling ? `Disable ${disabling.name}?` : 'Disable account'}
        description="They are signed out everywhere and cannot sign in until the account is enabled again. Their figures, revisions and comments stay."
      >
        <FormAlert message={formErrorMessage(update.error)} />
        <div className="flex justify-end gap-2">
          <Button onClick={() => setDisabling(null)}>Cancel</Button>
          <Button
            variant="danger"
            busy={update.isPending}
            onClick={() =>
              disabling &&
              update.mutate(
                { userId: disabling.id, change: { disabled: true } },
                { onSuccess: () => setDisabling(null) },
              )
            }
          >
            {update.isPending ? 'Disabling…' : 'Disable'}
          </Button>
        </div>
      </Dialog>
    </div>
  );
}
