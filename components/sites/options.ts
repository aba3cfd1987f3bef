import { SITE_KINDS, SITE_KIND_LABELS, SURFACES, SURFACE_LABELS } from '@/lib/register/model';

export const KIND_OPTIONS = SITE_KINDS.map((k) => ({ value: k, label: SITE_KIND_LABELS[k] }));
export const SURFACE_OPTIONS = SURFACES.map((s) => ({ value: s, label: SURFACE_LABELS[s] }));
