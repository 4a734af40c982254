// Turns the OpenAPI document into the SDK's TypeScript types with openapi-typescript, offline: the
// document is passed as an object, so nothing is fetched. Lives in sdk/ because openapi-typescript
// is the SDK's development dependency.
import openapiTS, { astToString } from 'openapi-typescript';
import type { OpenAPI3 } from 'openapi-typescript';

export const TYPES_BANNER = `/**
 * Generated from sdk/openapi.json by openapi-typescript. Do not edit: run \`npm run sdk:generate\`.
 */

`;

export async function schemaTypes(document: object): Promise<string> {
  const ast = await openapiTS(document as OpenAPI3, { alphabetize: false, exportType: false, silent: true, defaultNonNullable: false });
  return TYPES_BANNER + astToString(ast);
}
