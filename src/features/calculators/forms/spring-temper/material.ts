/** The material choice for a click spring whose modulus and yield the user types in. */
export const TYPED_MATERIAL = 'typed';
