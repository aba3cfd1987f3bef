import { ROLE_LABELS, ROLES } from '@/lib/domain';

export const ROLE_OPTIONS = ROLES.map((value) => ({ value, label: ROLE_LABELS[value] }));
