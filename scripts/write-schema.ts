/** Writes the JSON Schema of the plot file format to public/schema/ (`npm run schema`). */
import { mkdirSync, writeFileSync } from 'node:fs';
import { z } from 'zod';
import { PLOT_VERSION, plotDocument } from '../lib/plot';

const schema = z.toJSONSchema(plotDocument, { io: 'input', unrepresentable: 'any' });
mkdirSync('public/schema', { recursive: true });
const target = `public/schema/throwline-plot-v${PLOT_VERSION}.schema.json`;
writeFileSync(target, `${JSON.stringify(schema, null, 2)}\n`);
console.log(`wrote ${target}`);
