/**
 * The custom-functions metadata schema as published in @microsoft/app-manifest (the app manifest's
 * JSON schema carries the definition "extensionCustomFunctions": functions with id, name, parameters,
 * result, helpUrl; a draft-04 schema, so ajv-draft-04 reads it), and a validator for functions.json.
 */
import { readdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, join } from 'node:path';
import Ajv from 'ajv-draft-04';

const require = createRequire(import.meta.url);
const SCHEMAS = join(dirname(require.resolve('@microsoft/app-manifest/package.json')), 'build/json-schemas/teams');

/** The newest numbered schema version shipped in the package that defines custom functions. */
export function schemaVersion(): string {
  const versions = readdirSync(SCHEMAS)
    .filter((v) => /^v\d+\.\d+$/.test(v))
    .sort((a, b) => {
      const [a1, a2] = a.slice(1).split('.').map(Number);
      const [b1, b2] = b.slice(1).split('.').map(Number);
      return b1 - a1 || b2 - a2;
    });
  const found = versions.find((v) => require(join(SCHEMAS, v, 'MicrosoftTeams.schema.json')).definitions?.extensionCustomFunctions !== undefined);
  if (found === undefined) throw new Error(`no schema in ${SCHEMAS} defines extensionCustomFunctions`);
  return found;
}

export interface MetadataCheck {
  (data: unknown): boolean;
  errors?: Array<{ instancePath: string; message?: string }> | null;
}

/** A validator of a functions.json against the published custom-functions definition. */
export function metadataValidator(version = schemaVersion()): MetadataCheck {
  const full = require(join(SCHEMAS, version, 'MicrosoftTeams.schema.json'));
  // Formats are not this test's business (the published schema checks URLs by pattern as well).
  const ajv = new Ajv({ allErrors: true, strict: false, validateFormats: false });
  return ajv.compile({ definitions: full.definitions, $ref: '#/definitions/extensionCustomFunctions' }) as MetadataCheck;
}
