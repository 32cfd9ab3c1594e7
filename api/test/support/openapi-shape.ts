/**
 * Checks an answer against its schema in the served OpenAPI document, strictly: every required field present,
 * no field the contract does not name, types, enums and nullability as declared. What the studio's generated
 * types promise is then what the API sends.
 */
export interface SchemaObject {
  $ref?: string;
  type?: string;
  format?: string;
  nullable?: boolean;
  enum?: unknown[];
  items?: SchemaObject;
  properties?: Record<string, SchemaObject>;
  required?: string[];
  allOf?: SchemaObject[];
}

export interface OpenApiDocument {
  paths: Record<string, Record<string, { responses: Record<string, { content?: Record<string, { schema: SchemaObject }> }> }>>;
  components: { schemas: Record<string, SchemaObject> };
}

/** The JSON schema of an operation's answer. */
export function answerSchema(document: OpenApiDocument, path: string, method: string, status = '200'): SchemaObject {
  const schema = document.paths[path]?.[method]?.responses[status]?.content?.['application/json']?.schema;
  if (!schema) throw new Error(`${method.toUpperCase()} ${path} declares no JSON answer for ${status}`);
  return schema;
}

export function shapeProblems(document: OpenApiDocument, schema: SchemaObject, value: unknown, at = '$'): string[] {
  if (value === null) return nullable(document, schema) ? [] : [`${at} is null, which the contract does not allow`];
  if (schema.$ref) return shapeProblems(document, resolve(document, schema.$ref), value, at);
  if (schema.allOf) return schema.allOf.flatMap((part) => shapeProblems(document, part, value, at));
  if (schema.enum && !schema.enum.includes(value)) return [`${at} is ${JSON.stringify(value)}, not one of ${JSON.stringify(schema.enum)}`];
  switch (schema.type) {
    case 'string':
      if (typeof value !== 'string') return [`${at} should be a string`];
      return schema.format === 'date-time' && Number.isNaN(Date.parse(value)) ? [`${at} should be a date-time`] : [];
    case 'number':
    case 'integer':
      return typeof value === 'number' ? [] : [`${at} should be a number`];
    case 'boolean':
      return typeof value === 'boolean' ? [] : [`${at} should be a boolean`];
    case 'array':
      if (!Array.isArray(value)) return [`${at} should be an array`];
      return value.flatMap((item, index) => shapeProblems(document, schema.items ?? {}, item, `${at}[${index}]`));
    default:
      if (!schema.properties) return [];
      if (typeof value !== 'object' || Array.isArray(value)) return [`${at} should be an object`];
      return objectProblems(document, schema, value as Record<string, unknown>, at);
  }
}

function objectProblems(document: OpenApiDocument, schema: SchemaObject, value: Record<string, unknown>, at: string): string[] {
  const properties = schema.properties ?? {};
  const missing = (schema.required ?? []).filter((key) => !(key in value)).map((key) => `${at}.${key} is missing`);
  const unknown = Object.keys(value)
    .filter((key) => !(key in properties))
    .map((key) => `${at}.${key} is not in the contract`);
  const wrong = Object.entries(value)
    .filter(([key]) => key in properties)
    .flatMap(([key, item]) => shapeProblems(document, properties[key], item, `${at}.${key}`));
  return [...missing, ...unknown, ...wrong];
}

function nullable(document: OpenApiDocument, schema: SchemaObject): boolean {
  if (schema.nullable) return true;
  if (schema.$ref) return nullable(document, resolve(document, schema.$ref));
  return false;
}

function resolve(document: OpenApiDocument, ref: string): SchemaObject {
  const name = ref.replace('#/components/schemas/', '');
  const schema = document.components.schemas[name];
  if (!schema) throw new Error(`The contract has no schema ${name}`);
  return schema;
}
