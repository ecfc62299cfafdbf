/**
 * Reads the text inputs of every operation out of the OpenAPI document (with its $refs resolved):
 * each string a request can carry in its path, its query or its body, and how to reach it.
 * The NUL test and the structural test derive what they check from here, so a route added to
 * the document is covered without a line of test.
 */

export interface JsonSchema {
  type?: string | string[];
  format?: string;
  pattern?: string;
  enum?: unknown[];
  const?: unknown;
  properties?: Record<string, JsonSchema>;
  propertyNames?: JsonSchema;
  items?: JsonSchema;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  allOf?: JsonSchema[];
}

interface Parameter {
  name: string;
  in: 'path' | 'query' | 'header' | 'cookie';
  schema: JsonSchema;
}

interface Operation {
  operationId: string;
  parameters?: Parameter[];
  requestBody?: { content: Record<string, { schema: JsonSchema }> };
}

export type OpenApiDoc = { paths: Record<string, Record<string, Operation>> };

/** One string a request can carry. `fixed` are the values that pick its union branch ({ kind: 'coil' }). */
export interface TextInput {
  route: string;
  method: string;
  /** The OpenAPI path ("/api/parts/{id}"). */
  path: string;
  where: 'path' | 'query' | 'json' | 'form';
  /** Field path inside the body; for path and query, the parameter's name. */
  field: (string | number)[];
  /** A key of a record (a mapping's header) rather than a value. */
  isKey: boolean;
  fixed: { field: (string | number)[]; value: unknown }[];
  schema: JsonSchema;
}

const isString = (s: JsonSchema) => s.type === 'string' || (Array.isArray(s.type) && s.type.includes('string'));

function stringLeaves(
  schema: JsonSchema,
  field: (string | number)[],
  fixed: TextInput['fixed'],
  emit: (leaf: { field: (string | number)[]; fixed: TextInput['fixed']; isKey: boolean; schema: JsonSchema }) => void,
): void {
  for (const branch of [...(schema.anyOf ?? []), ...(schema.oneOf ?? [])]) {
    // A branch's constants (a discriminator) travel with every field found in it.
    const consts = Object.entries(branch.properties ?? {})
      .filter(([, p]) => p.const !== undefined || p.enum?.length === 1)
      .map(([k, p]) => ({ field: [...field, k], value: p.const ?? p.enum![0] }));
    stringLeaves(branch, field, [...fixed, ...consts], emit);
  }
  for (const part of schema.allOf ?? []) stringLeaves(part, field, fixed, emit);
  if (isString(schema) && schema.format !== 'binary') emit({ field, fixed, isKey: false, schema });
  for (const [key, prop] of Object.entries(schema.properties ?? {})) {
    if (prop.const !== undefined) continue;
    stringLeaves(prop, [...field, key], fixed, emit);
  }
  if (schema.propertyNames && isString(schema.propertyNames)) emit({ field, fixed, isKey: true, schema: schema.propertyNames });
  if (schema.items) stringLeaves(schema.items, [...field, 0], fixed, emit);
}

export function textInputs(doc: OpenApiDoc): TextInput[] {
  const out: TextInput[] = [];
  for (const [path, operations] of Object.entries(doc.paths)) {
    for (const [method, op] of Object.entries(operations)) {
      const base = { route: op.operationId, method: method.toUpperCase(), path };
      for (const p of op.parameters ?? []) {
        if (p.in !== 'path' && p.in !== 'query') continue;
        stringLeaves(p.schema, [p.name], [], (leaf) => out.push({ ...base, ...leaf, where: p.in as 'path' | 'query' }));
      }
      for (const [type, media] of Object.entries(op.requestBody?.content ?? {})) {
        const where = type === 'multipart/form-data' ? 'form' : 'json';
        stringLeaves(media.schema, [], [], (leaf) => out.push({ ...base, ...leaf, where }));
      }
    }
  }
  return out;
}

/** A body holding `value` at `field`, with the values that choose its branch. */
export function bodyWith(input: TextInput, value: unknown): unknown {
  let body: unknown = {};
  const put = (field: (string | number)[], v: unknown) => {
    if (field.length === 0) {
      body = v;
      return;
    }
    let node = body as Record<string | number, unknown>;
    field.forEach((key, i) => {
      if (i === field.length - 1) node[key] = v;
      else node = (node[key] ??= typeof field[i + 1] === 'number' ? [] : {}) as Record<string | number, unknown>;
    });
  };
  for (const f of input.fixed) put(f.field, f.value);
  if (input.isKey) put(input.field, { [String(value)]: null });
  else put(input.field, value);
  return body;
}
