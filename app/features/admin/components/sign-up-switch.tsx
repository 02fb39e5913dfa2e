// Opens or closes self-service sign-up for the whole site.
import { Switch } from '../../../components/ui/switch';
import { FormAlert } from '../../../components/ui/status';
import { formErrorMessage } from '../../../lib/form-errors';
import type { SiteSettings } from '../../../../shared/api/schemas';
import { useUpdateSiteSettings } from '../api/update-site-settings';

export function SignUpSwitch({
  settings,
  onChanged,
}: {
  settings: SiteSettings;
  onChanged: () => void;
}) {
  const update = useUpdateSiteSettings();
  const pending = update.isPending ? update.variables.signupEnabled : null;
  return (
    <div className="space-y-3">
      <Switch
        label="Anyone may create an account"
        hint="When off, the sign-up page is closed and no new accounts can be created there."
        checked={pending ?? settings.signupEnabled}
        disabled={update.isPending}
        onChange={(signupEnabled) =>
          update.mutate({ ...settings, signupEnabled }, { onSuccess: onChanged })
        }
      />
      <FormAlert message={formErrorMessage(update.error)} />
    </div>
  );
}
