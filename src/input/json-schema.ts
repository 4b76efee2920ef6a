// The JSON Schema of the input format, printed by `polebook schema`, made from the zod schema.
import { z } from 'zod';
import { buildInputSchema } from './schema.ts';

export function designJsonSchema(): object {
  // Quantities read as number | string on input; the unit system does not change the shape.
  return z.toJSONSchema(buildInputSchema('us'), { io: 'input', target: 'draft-2020-12' });
}
