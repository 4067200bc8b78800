import type { Role } from '@hopwise/common';

/** Plain names of the roles of SPEC §1, for people rather than for the API. */
export const ROLE_LABELS: Readonly<Record<Role, string>> = {
  operator: 'Operator',
  netcontrol: 'Net control',
  analyst: 'Analyst',
  admin: 'Administrator',
};

export const roleLabel = (role: string): string =>
  (ROLE_LABELS as Record<string, string>)[role] ?? role;
