import openapiTS, { astToString } from 'openapi-typescript';
import { format, resolveConfig } from 'prettier';

/** Where the web app's generated payload types live (web/src/types/api.ts aliases them). */
export const GENERATED_TYPES_PATH = 'web/src/types/api.generated.ts';

const HEADER = [
  "// Generated from the API's OpenAPI document by `npm run openapi:types`. Do not edit by hand:",
  '// api/test/openapi-types.e2e-spec.ts fails when this file and the API disagree.',
  '',
].join('\n');

/** TypeScript declarations for an OpenAPI document, formatted with the repository's Prettier. */
export async function renderApiTypes(document: unknown, repoRoot: string): Promise<string> {
  const ast = await openapiTS(document as Parameters<typeof openapiTS>[0]);
  const source = HEADER + astToString(ast);
  const options = (await resolveConfig(`${repoRoot}/${GENERATED_TYPES_PATH}`)) ?? {};
  return format(source, { ...options, parser: 'typescript' });
}
