// `npm run schema`: print the JSON Schema of the plan file, generated from the zod schema.
import { z } from 'zod';
import { planSchema } from '@/schema/planSchema';

const jsonSchema = z.toJSONSchema(planSchema, { io: 'input', unrepresentable: 'any' });
process.stdout.write(`${JSON.stringify({ title: 'Coolstage plan file', ...jsonSchema }, null, 2)}\n`);
