// The names of the language's types, as a closed list: signatures of functions and families, the
// static checker and run-time type errors all use these, so a misspelt type does not compile.
// A new kind of value adds its name here (one line, kept in alphabetical order within its group).

/** The kinds of Structured values (`kind`, and a family's `objectKind`). */
export const OBJECT_KINDS = [
  'asm',
  'chain',
  'composition',
  'distribution',
  'dyck',
  'function',
  'ideal',
  'matching',
  'matrix',
  'measure',
  'motzkin',
  'parkingFunction',
  'partition',
  'permutation',
  'pipeDream',
  'polynomial',
  'rationalFunction',
  'setPartition',
  'signedPermutation',
  'subset',
  'symmetric',
  'tableau',
  'word',
] as const;

/** The primitive types, and the wider static types signatures may use. */
export const PRIMITIVE_TYPES = [
  'boolean',
  'integer',
  'list',
  'rational',
  'string',
  // An integer or a rational.
  'number',
  // A number or a polynomial (constants are numbers, never polynomials).
  'scalarOrPolynomial',
  // Anything; also the static type of what is known only at run time.
  'any',
  // What typeOf says of something that is no value of the language (never declared).
  'unknown',
] as const;

export type ObjectKind = (typeof OBJECT_KINDS)[number];
export type TypeName = ObjectKind | (typeof PRIMITIVE_TYPES)[number];

const NAMES: ReadonlySet<string> = new Set<string>([...OBJECT_KINDS, ...PRIMITIVE_TYPES]);

/** Whether a string (from a plugin file, say) is a type name. */
export function isTypeName(s: string): s is TypeName {
  return NAMES.has(s);
}

/** Every type name, for "did you mean". */
export function allTypeNames(): TypeName[] {
  return [...NAMES] as TypeName[];
}
