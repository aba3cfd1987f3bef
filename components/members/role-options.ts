import { ROLES } from '@/db/types';
import { ROLE_LABELS } from '@/components/layout/app-header';

export const ROLE_OPTIONS = ROLES.map((value) => ({ value, label: ROLE_LABELS[value] }));
