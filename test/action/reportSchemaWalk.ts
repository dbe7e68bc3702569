import { readFileSync } from 'node:fs';
import path from 'node:path';

/**
 * Walks docs/report.schema.json beside a report value, so tests can check the action's report
 * reader against the schema field by field: each required field, each optional one, each closed
 * list of words (`enum`, `const`), each with its JSON path as the reader names it
 * (`$.comparisons[1].dieboldMariano.state`).
 */

export type JsonSchema = {
  readonly $ref?: string;
  readonly type?: string | readonly string[];
  readonly required?: readonly string[];
  readonly properties?: Readonly<Record<string, JsonSchema>>;
  readonly additionalProperties?: JsonSchema | boolean;
  readonly items?: JsonSchema;
  readonly oneOf?: readonly JsonSchema[];
  readonly enum?: readonly unknown[];
  readonly const?: unknown;
  readonly definitions?: Readonly<Record<string, JsonSchema>>;
  /** Draft-07 conditionals, as used here: a `const` on one property makes `then` apply. */
  readonly if?: JsonSchema;
  readonly then?: JsonSchema;
  readonly allOf?: readonly JsonSchema[];
  /** Draft-07 property dependencies: with the key present, these fields are required too. */
  readonly dependencies?: Readonly<Record<string, readonly string[]>>;
};

/** One step into a value: a property name or an array index. */
export type Segment = string | number;

export interface SchemaField {
  /** Where the field is in the report value. */
  readonly at: readonly Segment[];
  /** The schema of the field, $ref resolved. */
  readonly schema: JsonSchema;
}

export interface SchemaWalk {
  readonly required: SchemaField[];
  readonly optional: SchemaField[];
  /** Fields whose schema is a closed list: `enum`, or `const` as a list of one. */
  readonly closed: (SchemaField & { readonly values: readonly unknown[] })[];
  /** Object keys of the value that the schema does not name (where it names properties). */
  readonly unnamed: SchemaField[];
}

const root = path.resolve(import.meta.dirname, '..', '..');

export function readReportSchema(): JsonSchema {
  return JSON.parse(readFileSync(path.join(root, 'docs', 'report.schema.json'), 'utf8'));
}

/** `$.a.b[0].c`, as the reader's messages write a path. */
export function pathText(at: readonly Segment[]): string {
  return `$${at.map((s) => (typeof s === 'number' ? `[${s}]` : `.${s}`)).join('')}`;
}

/** The path with every index as [*], to name a field of every item of a list at once. */
export function pathPattern(at: readonly Segment[]): string {
  return pathText(at.map((s) => (typeof s === 'number' ? '*' : s))).replaceAll('.*', '[*]');
}

const isObject = (v: unknown): v is Record<string, unknown> =>
  typeof v === 'object' && v !== null && !Array.isArray(v);

export function walkSchema(schema: JsonSchema, value: unknown): SchemaWalk {
  const walk: SchemaWalk = { required: [], optional: [], closed: [], unnamed: [] };
  const resolve = (node: JsonSchema): JsonSchema => {
    if (node.$ref === undefined) return node;
    const name = node.$ref.replace('#/definitions/', '');
    const target = schema.definitions?.[name];
    if (target === undefined) throw new Error(`unresolved ${node.$ref}`);
    return resolve(target);
  };
  const describesObject = (node: JsonSchema) =>
    node.properties !== undefined ||
    node.type === 'object' ||
    (Array.isArray(node.type) && node.type.includes('object'));
  const visit = (given: JsonSchema, v: unknown, at: Segment[]): void => {
    let node = resolve(given);
    if (node.oneOf !== undefined) {
      const branch = node.oneOf.map(resolve).find((b) => isObject(v) && describesObject(b));
      // A choice between a word and a number (a horizon: "all" or h) is not a closed list.
      if (branch === undefined) return;
      node = branch;
    }
    if (node.enum !== undefined) walk.closed.push({ at, schema: node, values: node.enum });
    if (node.const !== undefined) walk.closed.push({ at, schema: node, values: [node.const] });
    if (Array.isArray(v) && node.items !== undefined) {
      const items = node.items;
      v.forEach((item, i) => {
        visit(items, item, [...at, i]);
      });
      return;
    }
    if (!isObject(v)) return;
    const properties = node.properties ?? {};
    const required = [...(node.required ?? [])];
    for (const [key, also] of Object.entries(node.dependencies ?? {})) {
      if (Object.hasOwn(v, key)) required.push(...also);
    }
    for (const c of [node, ...(node.allOf ?? [])]) {
      if (c.if === undefined || c.then === undefined) continue;
      const holds = Object.entries(c.if.properties ?? {}).every(([k, p]) => v[k] === p.const);
      if (holds) required.push(...(c.then.required ?? []));
    }
    for (const key of required) {
      walk.required.push({ at: [...at, key], schema: resolve(properties[key] ?? {}) });
    }
    for (const [key, child] of Object.entries(properties)) {
      if (!required.includes(key)) {
        walk.optional.push({ at: [...at, key], schema: resolve(child) });
      }
      if (Object.hasOwn(v, key)) visit(child, v[key], [...at, key]);
    }
    const extra = typeof node.additionalProperties === 'object' ? node.additionalProperties : null;
    for (const key of Object.keys(v)) {
      if (Object.hasOwn(properties, key)) continue;
      if (extra !== null) visit(extra, v[key], [...at, key]);
      else if (node.properties !== undefined) walk.unnamed.push({ at: [...at, key], schema: {} });
    }
  };
  visit(schema, value, []);
  return walk;
}

/** A deep copy of `value` with the field at `at` removed (or replaced by `by`). */
export function without(value: unknown, at: readonly Segment[], by?: unknown): unknown {
  // Through JSON, as the reader sees it: an object shared by two fields becomes two copies.
  const copy = JSON.parse(JSON.stringify(value));
  let parent = copy as Record<Segment, unknown>;
  for (const s of at.slice(0, -1)) parent = parent[s] as Record<Segment, unknown>;
  const last = at[at.length - 1]!;
  if (by === undefined) delete parent[last];
  else parent[last] = by;
  return copy;
}

/** Whether the value has a field at `at`. */
export function has(value: unknown, at: readonly Segment[]): boolean {
  let v = value;
  for (const s of at) {
    if (typeof v !== 'object' || v === null || !Object.hasOwn(v, s)) return false;
    v = (v as Record<Segment, unknown>)[s];
  }
  return true;
}
