import { PLATE_SETS } from '@shared/calc/dividing';

export const OWN_CIRCLES = 'own';

export const PLATE_CHOICES = [
  ...PLATE_SETS.map((p) => ({ value: p.key, label: p.label })),
  { value: OWN_CIRCLES, label: 'My own hole circles' },
];
