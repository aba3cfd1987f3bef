import type { DragModel } from '@/lib/physics';

export const MODEL_LABELS: Record<'auto' | DragModel, string> = {
  auto: 'Automatic (Newton’s quadratic law)',
  quadratic: 'Quadratic (Newton’s drag law)',
  linear: 'Linear (Stokes’ law)',
  linear_quadratic: 'Linear plus quadratic',
  none: 'None (vacuum)',
};

export const PATH_LABELS = {
  air: 'Air, to the ground or deck',
  seawater: 'Seawater only',
  freshwater: 'Fresh water only',
  custom: 'Custom medium',
  deck_to_sea: 'Deck to seabed: air, then seawater',
} as const;

export const RELEASE_LABELS = {
  rest: 'Dropped from rest',
  thrown: 'Thrown or knocked off',
  swing: 'Swinging on a sling',
} as const;
