// The project-role picker used wherever someone is given a role (adding a member, inviting one):
// each role by name, with what it allows as the hint.
import { projectRoles, roleDescriptions, type ProjectRole } from '../../../shared/api/roles';
import { SelectField } from './form-field';
import { roleName } from './role-badge';

export function RoleSelectField({
  value,
  onChange,
  error,
  className = 'w-64',
}: {
  value: ProjectRole;
  onChange: (role: ProjectRole) => void;
  error?: string;
  className?: string;
}) {
  return (
    <SelectField
      label="Role"
      name="role"
      value={value}
      onChange={(e) => onChange(e.target.value as ProjectRole)}
      error={error}
      hint={roleDescriptions[value]}
      className={className}
    >
      {projectRoles.map((r) => (
        <option key={r} value={r}>
          {roleName(r)}
        </option>
      ))}
    </SelectField>
  );
}
