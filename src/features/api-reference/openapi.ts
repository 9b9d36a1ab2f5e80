import { permissions, type Action } from '../../shared/permissions';
import { roles as allRoles, type Role } from '../../shared/schemas/common';

/**
 * Just enough of OpenAPI 3.1 to read the document our server publishes and lay it out
 * for people: operations grouped by tag, with their fields flattened to dotted paths.
 */
export type JsonSchema = {
  $ref?: string;
  type?: string | string[];
  format?: string;
  title?: string;
  description?: string;
  enum?: unknown[];
  const?: unknown;
  default?: unknown;
  properties?: Record<string, JsonSchema>;
  required?: string[];
  items?: JsonSchema;
  additionalProperties?: boolean | JsonSchema;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  allOf?: JsonSchema[];
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  exclusiveMaximum?: number;
  minLength?: number;
  maxLength?: number;
  minItems?: number;
  maxItems?: number;
  pattern?: string;
  nullable?: boolean;
};

type MediaType = { schema?: JsonSchema };
type Parameter = {
  name: string;
  in: 'path' | 'query' | 'header' | 'cookie';
  required?: boolean;
  description?: string;
  schema?: JsonSchema;
};
type RawOperation = {
  operationId?: string;
  summary?: string;
  description?: string;
  tags?: string[];
  deprecated?: boolean;
  parameters?: (Parameter | { $ref: string })[];
  requestBody?: { required?: boolean; description?: string; content?: Record<string, MediaType> };
  responses?: Record<string, { description?: string; content?: Record<string, MediaType> }>;
  security?: Record<string, string[]>[];
  [extension: `x-${string}`]: unknown;
};

export type OpenApiDocument = {
  openapi: string;
  info: { title: string; version: string; description?: string };
  tags?: { name: string; description?: string }[];
  paths?: Record<string, Record<string, unknown>>;
  components?: { schemas?: Record<string, JsonSchema>; parameters?: Record<string, Parameter> };
  security?: Record<string, string[]>[];
};

export type Field = {
  path: string;
  type: string;
  required: boolean;
  description?: string;
  constraints: string[];
};

/** Who may call an operation: named roles, anyone signed in, or anyone at all. */
export type Access = { kind: 'roles'; roles: Role[] } | { kind: 'signed-in' } | { kind: 'public' };

export type Operation = {
  id: string;
  method: string;
  path: string;
  summary?: string;
  description?: string;
  tag: string;
  deprecated: boolean;
  access: Access;
  parameters: Field[];
  requestContentType?: string;
  requestFields: Field[] | null;
  responses: { status: string; description?: string; fields: Field[] }[];
};

export type OperationGroup = { tag: string; description?: string; operations: Operation[] };

const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;
export const UNTAGGED = 'Other';
const MAX_DEPTH = 5;

function refName(ref: string): string {
  return ref.split('/').pop() ?? ref;
}

/** Follows a local `#/...` reference; an unknown one yields an empty schema. */
export function resolveRef<T = JsonSchema>(doc: OpenApiDocument, ref: string): T | undefined {
  if (!ref.startsWith('#/')) return undefined;
  let node: unknown = doc;
  for (const part of ref.slice(2).split('/')) {
    const key = part.replace(/~1/g, '/').replace(/~0/g, '~');
    if (typeof node !== 'object' || node === null) return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  return node as T | undefined;
}

function deref(doc: OpenApiDocument, schema: JsonSchema, seen: Set<string>): JsonSchema {
  let current = schema;
  while (current.$ref && !seen.has(current.$ref)) {
    seen.add(current.$ref);
    const target = resolveRef<JsonSchema>(doc, current.$ref) ?? {};
    current = { ...target, description: current.description ?? target.description };
  }
  return current;
}

/** Splits "T or null" into T and a nullable flag (3.1 writes it as a type list or anyOf). */
function unwrapNullable(schema: JsonSchema): { schema: JsonSchema; nullable: boolean } {
  if (Array.isArray(schema.type) && schema.type.includes('null')) {
    const rest = schema.type.filter((type) => type !== 'null');
    return { schema: { ...schema, type: rest.length === 1 ? rest[0] : rest }, nullable: true };
  }
  const options = schema.anyOf ?? schema.oneOf;
  if (options) {
    const nonNull = options.filter((option) => option.type !== 'null');
    if (nonNull.length === 1 && nonNull.length < options.length) {
      return { schema: { description: schema.description, ...nonNull[0] }, nullable: true };
    }
  }
  return { schema, nullable: schema.nullable === true };
}

function mergeAllOf(doc: OpenApiDocument, schema: JsonSchema, seen: Set<string>): JsonSchema {
  if (!schema.allOf) return schema;
  const merged: JsonSchema = { ...schema, allOf: undefined, properties: { ...schema.properties }, required: [...(schema.required ?? [])] };
  for (const part of schema.allOf) {
    const resolved = mergeAllOf(doc, deref(doc, part, new Set(seen)), seen);
    Object.assign(merged.properties!, resolved.properties);
    merged.required!.push(...(resolved.required ?? []));
    merged.type ??= resolved.type;
  }
  return merged;
}

/**
 * One schema made plain: references followed, `allOf` merged and "or null" split off,
 * keeping the referenced schema's name (e.g. "Member") for display.
 */
function normalize(doc: OpenApiDocument, schema: JsonSchema, seen: Set<string>): { schema: JsonSchema; nullable: boolean; name?: string } {
  const name = schema.$ref ? refName(schema.$ref) : undefined;
  const { schema: inner, nullable } = unwrapNullable(mergeAllOf(doc, deref(doc, schema, seen), seen));
  if (inner.$ref && !seen.has(inner.$ref)) {
    const again = normalize(doc, inner, seen);
    return { schema: again.schema, nullable: nullable || again.nullable, name: name ?? again.name };
  }
  return { schema: inner, nullable, name };
}

/** A short human name for a schema's type: "string (email)", "array of Member", "string or null". */
export function describeType(doc: OpenApiDocument, schema: JsonSchema, seen = new Set<string>()): string {
  const local = new Set(seen);
  const { schema: inner, nullable, name } = normalize(doc, schema, local);
  let text: string;
  if (inner.const !== undefined) text = JSON.stringify(inner.const);
  else if (inner.anyOf || inner.oneOf) {
    text = (inner.anyOf ?? inner.oneOf ?? []).map((option) => describeType(doc, option, local)).join(' or ');
  } else {
    const type = Array.isArray(inner.type) ? inner.type.join(' or ') : (inner.type ?? (inner.properties ? 'object' : 'any'));
    if (type === 'array') text = `array of ${inner.items ? describeType(doc, inner.items, local) : 'any'}`;
    else if (type === 'object' && name) text = name;
    else text = inner.format ? `${type} (${inner.format})` : type;
  }
  return nullable ? `${text} or null` : text;
}

function constraintsOf(schema: JsonSchema): string[] {
  const out: string[] = [];
  if (schema.enum) out.push(`one of ${schema.enum.map((value) => JSON.stringify(value)).join(', ')}`);
  if (schema.minLength !== undefined) out.push(`min length ${schema.minLength}`);
  if (schema.maxLength !== undefined) out.push(`max length ${schema.maxLength}`);
  if (schema.minimum !== undefined) out.push(`≥ ${schema.minimum}`);
  if (schema.exclusiveMinimum !== undefined) out.push(`> ${schema.exclusiveMinimum}`);
  if (schema.maximum !== undefined) out.push(`≤ ${schema.maximum}`);
  if (schema.exclusiveMaximum !== undefined) out.push(`< ${schema.exclusiveMaximum}`);
  if (schema.minItems !== undefined) out.push(`at least ${schema.minItems} items`);
  if (schema.maxItems !== undefined) out.push(`at most ${schema.maxItems} items`);
  // A format (email, uuid, date) already says what the pattern spells out.
  if (schema.pattern && !schema.format) out.push(`pattern ${schema.pattern}`);
  if (schema.default !== undefined) out.push(`default ${JSON.stringify(schema.default)}`);
  return out;
}

/**
 * Lists an object schema's fields as dotted paths, nested objects and arrays of objects
 * included ("priceBreaks[].unitPrice"), so a request body reads as one table.
 */
export function flattenFields(doc: OpenApiDocument, schema: JsonSchema | undefined, prefix = '', depth = 0, seen = new Set<string>()): Field[] {
  if (!schema || depth > MAX_DEPTH) return [];
  const local = new Set(seen);
  const { schema: resolved } = normalize(doc, schema, local);
  if (resolved.type === 'array' && resolved.items && depth === 0) {
    return flattenFields(doc, resolved.items, `${prefix}[]`, depth + 1, local);
  }
  const required = new Set(resolved.required ?? []);
  const fields: Field[] = [];
  for (const [name, property] of Object.entries(resolved.properties ?? {})) {
    const path = prefix ? `${prefix}.${name}` : name;
    const propSeen = new Set(local);
    const { schema: inner } = normalize(doc, property, propSeen);
    fields.push({
      path,
      type: describeType(doc, property, local),
      required: required.has(name),
      description: property.description ?? inner.description,
      constraints: constraintsOf(inner),
    });
    if (inner.properties) {
      fields.push(...flattenFields(doc, inner, path, depth + 1, propSeen));
    } else if (inner.type === 'array' && inner.items) {
      const items = normalize(doc, inner.items, new Set(propSeen)).schema;
      if (items.properties) fields.push(...flattenFields(doc, inner.items, `${path}[]`, depth + 1, propSeen));
    }
  }
  return fields;
}

function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (allRoles as readonly string[]).includes(value);
}

/**
 * Who may call an operation. Our server writes its route's access rule as `x-access`:
 * "public", "signedIn" or a permission of shared/permissions.ts, which maps to roles.
 * Explicit role lists (`x-roles`) and an empty `security` list are understood too.
 */
export function accessOf(doc: OpenApiDocument, operation: RawOperation): Access {
  const rule = operation['x-access'] ?? operation['x-permission'];
  if (rule === 'public') return { kind: 'public' };
  if (rule === 'signedIn') return { kind: 'signed-in' };
  if (typeof rule === 'string' && Object.hasOwn(permissions, rule)) {
    return { kind: 'roles', roles: [...permissions[rule as Action]] };
  }
  const listed = operation['x-roles'];
  const named = (Array.isArray(listed) ? listed : [listed]).filter(isRole);
  if (named.length > 0) return { kind: 'roles', roles: named };
  const security = operation.security ?? doc.security;
  if (security && security.length === 0) return { kind: 'public' };
  return { kind: 'signed-in' };
}

/** Drops the description's access sentence when the access rule is shown on its own line. */
function descriptionOf(operation: RawOperation): string | undefined {
  const text = operation.description?.replace(/^Who may call it:[^\n]*\n?/m, '').trim();
  return text || undefined;
}

function parameterFields(doc: OpenApiDocument, pathLevel: unknown, operation: RawOperation): Field[] {
  const raw = [...(Array.isArray(pathLevel) ? pathLevel : []), ...(operation.parameters ?? [])] as (Parameter | { $ref: string })[];
  return raw
    .map((parameter) => ('$ref' in parameter ? resolveRef<Parameter>(doc, parameter.$ref) : parameter))
    .filter((parameter): parameter is Parameter => Boolean(parameter?.name))
    .map((parameter) => {
      const schema = parameter.schema ?? {};
      const resolved = normalize(doc, schema, new Set()).schema;
      return {
        path: parameter.name,
        type: `${describeType(doc, schema)} · ${parameter.in}`,
        required: parameter.in === 'path' || parameter.required === true,
        description: parameter.description ?? resolved.description,
        constraints: constraintsOf(resolved),
      };
    });
}

function jsonContent(content: Record<string, MediaType> | undefined): [string, MediaType] | undefined {
  if (!content) return undefined;
  const entries = Object.entries(content);
  return entries.find(([type]) => type.includes('json')) ?? entries[0];
}

export function listOperations(doc: OpenApiDocument): Operation[] {
  const operations: Operation[] = [];
  for (const [path, item] of Object.entries(doc.paths ?? {})) {
    for (const method of METHODS) {
      const operation = item[method] as RawOperation | undefined;
      if (!operation) continue;
      const body = jsonContent(operation.requestBody?.content);
      operations.push({
        id: operation.operationId ?? `${method}-${path}`,
        method: method.toUpperCase(),
        path,
        summary: operation.summary,
        description: descriptionOf(operation),
        tag: operation.tags?.[0] ?? UNTAGGED,
        deprecated: operation.deprecated === true,
        access: accessOf(doc, operation),
        parameters: parameterFields(doc, item.parameters, operation),
        requestContentType: body?.[0],
        requestFields: body ? flattenFields(doc, body[1].schema) : null,
        responses: Object.entries(operation.responses ?? {})
          .sort(([a], [b]) => a.localeCompare(b))
          .map(([status, response]) => ({
            status,
            description: response.description,
            fields: flattenFields(doc, jsonContent(response.content)?.[1].schema),
          })),
      });
    }
  }
  return operations;
}

/** Groups operations by their first tag, in the document's tag order, untagged last. */
export function groupByTag(doc: OpenApiDocument, operations: Operation[]): OperationGroup[] {
  const order = (doc.tags ?? []).map((tag) => tag.name);
  const names = [...new Set(operations.map((operation) => operation.tag))].sort((a, b) => {
    if (a === UNTAGGED) return 1;
    if (b === UNTAGGED) return -1;
    const ia = order.indexOf(a);
    const ib = order.indexOf(b);
    if (ia !== -1 || ib !== -1) return (ia === -1 ? Infinity : ia) - (ib === -1 ? Infinity : ib);
    return a.localeCompare(b);
  });
  return names.map((tag) => ({
    tag,
    description: doc.tags?.find((entry) => entry.name === tag)?.description,
    operations: operations.filter((operation) => operation.tag === tag),
  }));
}
