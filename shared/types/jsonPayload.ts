/**
 * The payload type of a plain JSON schema declared `as const` (shared/schemas), by json-schema-to-ts. Fields
 * with a schema default stay optional: ajv (useDefaults) fills them in on the API, but the engine is also
 * called with payloads built in code and applies the same defaults itself.
 */
import type { FromSchema, JSONSchema } from 'json-schema-to-ts';

export type JsonPayload<S extends JSONSchema> = FromSchema<S, { keepDefaultedPropertiesOptional: true }>;
