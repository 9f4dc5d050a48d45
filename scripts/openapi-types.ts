/**
 * Writes web/src/types/api.generated.ts from a running API's OpenAPI document:
 *   npm run openapi:types                       (API at http://127.0.0.1:$PORT, default 4400)
 *   npm run openapi:types -- http://host:port   (another API)
 */
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { GENERATED_TYPES_PATH, renderApiTypes } from './lib/openapi-types';

async function main(): Promise<void> {
  const base = process.argv[2] ?? `http://127.0.0.1:${process.env.PORT ?? '4400'}`;
  const response = await fetch(`${base.replace(/\/$/, '')}/api/docs-json`);
  if (!response.ok)
    throw new Error(`${base}/api/docs-json answered ${response.status}: is the API running?`);
  const output = await renderApiTypes(await response.json(), process.cwd());
  writeFileSync(join(process.cwd(), GENERATED_TYPES_PATH), output);
  console.log(`Wrote ${GENERATED_TYPES_PATH}`);
}

main().catch((error: unknown) => {
  console.error((error as Error).message);
  process.exit(1);
});
