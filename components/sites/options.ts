import { SITE_KIND_LABELS, SITE_KINDS, SURFACE_LABELS, SURFACES } from '@/lib/domain';

export const KIND_OPTIONS = SITE_KINDS.map((k) => ({ value: k, label: SITE_KIND_LABELS[k] }));
export const SURFACE_OPTIONS = SURFACES.map((s) => ({ value: s, label: SURFACE_LABELS[s] }));
