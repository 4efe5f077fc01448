import { z } from 'zod';

const EXPECTED: Record<string, string> = {
  object: 'a group of fields ({ … })',
  array: 'a list ([ … ])',
  number: 'a number',
  string: 'text',
  boolean: 'true or false',
  int: 'a whole number',
};

/**
 * Plain-words defaults for zod's generic messages, installed once for every schema in the product
 * (client and server alike) so that a missing field says "is required" and a wrong type says what
 * was expected. Schemas with their own message keep it.
 */
z.config({
  customError: (iss) => {
    if (iss.code === 'invalid_type') {
      if (iss.input === undefined) return 'is required';
      return `must be ${EXPECTED[iss.expected] ?? iss.expected}`;
    }
    if (iss.code === 'invalid_value') return `must be one of ${iss.values.map((v) => JSON.stringify(v)).join(', ')}`;
    return undefined;
  },
});

export { z };
