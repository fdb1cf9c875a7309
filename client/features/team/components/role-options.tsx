import { ROLE_LABELS, ROLES } from '../../../../shared/domain/roles';

/** The `<option>`s of a role select, most privileged first. */
export function RoleOptions() {
  return ROLES.map((role) => (
    <option key={role} value={role}>
      {ROLE_LABELS[role]}
    </option>
  ));
}
