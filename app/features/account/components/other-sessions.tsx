// Other browsers signed in to this account, and a way to sign them all out (this one stays).
import { Button } from '../../../components/ui/button';
import { FormAlert, SavedNote } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import { useSignOutOtherSessions } from '../api/sign-out-other-sessions';
import { countOf } from '../utils/count-of';

export function OtherSessions({ count }: { count: number }) {
  const signOutOthers = useSignOutOtherSessions();
  return (
    <div className="space-y-4">
      <p className="text-sm text-stone-700">
        {count === 0
          ? 'You are signed in on this browser only.'
          : `You are also signed in on ${countOf(count, 'other browser or device', 'other browsers or devices')}.`}
      </p>
      <FormAlert message={formErrorMessage(signOutOthers.error)} />
      <Button
        busy={signOutOthers.isPending}
        disabled={count === 0}
        onClick={() => signOutOthers.mutate()}
      >
        {signOutOthers.isPending ? 'Signing out…' : 'Sign out everywhere else'}
      </Button>
      {signOutOthers.isSuccess && (
        <SavedNote>
          Signed out of {countOf(signOutOthers.data.signedOut, 'other session', 'other sessions')}.
        </SavedNote>
      )}
    </div>
  );
}
