// Ends the session and returns to the sign-in page.
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/button';
import { useSignOut } from '../api/sign-out';

export function SignOutButton() {
  const signOut = useSignOut();
  const navigate = useNavigate();
  return (
    <Button
      variant="quiet"
      size="sm"
      busy={signOut.isPending}
      onClick={() =>
        signOut.mutate(undefined, { onSuccess: () => void navigate('/sign-in', { replace: true }) })
      }
    >
      {signOut.isPending ? 'Signing out…' : 'Sign out'}
    </Button>
  );
}
