// The signed-in user, for pages inside <RequireUser> (which guarantees there is one).
import type { User } from '../../../../shared/api/schemas';
import { useSession } from '../api/get-session';

export function useSignedInUser(): User {
  const { data } = useSession();
  if (!data?.user) throw new Error('useSignedInUser is only for pages behind RequireUser');
  return data.user;
}
