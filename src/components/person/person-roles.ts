import { ROLES, type Role } from '../../../shared/schemas/users';

export const ROLE_LABELS: Record<Role, string> = {
  engineer: 'Engineer',
  lead: 'Lead',
  operator: 'Operator',
  admin: 'Admin',
};

/** What each role gets done, shown where a role is chosen or refused. */
export const ROLE_DUTIES: Record<Role, string> = {
  engineer: 'composes and predicts recipes, submits them for sign-off',
  lead: 'reviews and signs off recipe versions',
  operator: 'opens lots, prints run travellers, records measurements',
  admin: 'manages people, roles and tubes',
};

export const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));
