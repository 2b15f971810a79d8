export const SPRING_STEEL = 'spring-steel';
export const TYPED_MODULUS = 'typed';
/** Tokai Bane "Flat springs formulas", Table 2: E = 206×10³ N/mm² for spring steel. */
export const SPRING_STEEL_GPA = 206;

export const MATERIALS = [
  { value: SPRING_STEEL, label: 'Carbon spring steel (E = 206 GPa)' },
  { value: TYPED_MODULUS, label: 'Another material: enter its modulus' },
] as const;
