import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { RecordedRequest } from './fakeGitHubServer.js';

/**
 * Checks requests against GitHub's published REST description (the npm package
 * `@octokit/openapi`, file generated/api.github.com.json, OpenAPI 3): the path must match one of
 * its path templates, the method must be an operation of that path, every query parameter must
 * be one the operation declares (with an integer where it says integer, a listed value where it
 * lists values), and a JSON body may hold only the properties of the operation's request schema,
 * with every required one present and of the declared primitive type.
 */
interface Parameter {
  readonly name: string;
  readonly in: string;
  readonly required?: boolean;
  readonly schema?: { readonly type?: string; readonly enum?: readonly unknown[] };
}
interface Operation {
  readonly operationId: string;
  readonly parameters?: readonly (Parameter | { readonly $ref: string })[];
  readonly requestBody?: {
    readonly content?: Record<string, { readonly schema?: BodySchema }>;
  };
}
interface BodySchema {
  readonly type?: string;
  readonly properties?: Record<string, { readonly type?: string | readonly string[] }>;
  readonly required?: readonly string[];
}
interface Description {
  readonly paths: Record<string, Record<string, Operation>>;
  readonly components: { readonly parameters: Record<string, Parameter> };
}

let cached: Description | null = null;
function description(): Description {
  if (cached === null) {
    const require = createRequire(import.meta.url);
    const file = require.resolve('@octokit/openapi/generated/api.github.com.json');
    cached = JSON.parse(readFileSync(file, 'utf8')) as Description;
  }
  return cached;
}

function templateRegex(template: string): RegExp {
  const pattern = template
    .split(/(\{[^}]+\})/)
    .map((part) => (part.startsWith('{') ? '([^/]+)' : part.replace(/[.*+?^$()|[\]\\]/g, '\\$&')))
    .join('');
  return new RegExp(`^${pattern}$`);
}

function resolve(p: Parameter | { readonly $ref: string }, spec: Description): Parameter {
  if ('$ref' in p) {
    const name = p.$ref.replace('#/components/parameters/', '');
    const found = spec.components.parameters[name];
    if (found === undefined) throw new Error(`unresolved ${p.$ref}`);
    return found;
  }
  return p;
}

function primitiveOk(value: unknown, type: string | readonly string[] | undefined): boolean {
  if (type === undefined) return true;
  const types = typeof type === 'string' ? [type] : type;
  return types.some((t) =>
    t === 'integer'
      ? Number.isSafeInteger(value)
      : t === 'array'
        ? Array.isArray(value)
        : t === 'object'
          ? typeof value === 'object' && value !== null && !Array.isArray(value)
          : t === 'null'
            ? value === null
            : typeof value === t,
  );
}

/** Problems with one request, each a sentence; empty when it conforms. */
export function checkRequest(request: RecordedRequest): string[] {
  const spec = description();
  const label = `${request.method} ${request.path}`;
  const matches = Object.keys(spec.paths).filter((t) => templateRegex(t).test(request.path));
  // A literal segment wins over a parameter, as in routing (/issues/comments/{id} vs /issues/{n}).
  const template = matches.sort(
    (a, b) => (a.match(/\{/g) ?? []).length - (b.match(/\{/g) ?? []).length,
  )[0];
  if (template === undefined) return [`${label}: no such path in the REST description`];
  const operation = spec.paths[template]?.[request.method.toLowerCase()];
  if (operation === undefined) return [`${label}: ${template} has no ${request.method}`];
  const problems: string[] = [];
  const parameters = (operation.parameters ?? []).map((p) => resolve(p, spec));

  const values = templateRegex(template).exec(request.path)?.slice(1) ?? [];
  const names = [...template.matchAll(/\{([^}]+)\}/g)].map((m) => m[1]);
  names.forEach((name, i) => {
    const declared = parameters.find((p) => p.in === 'path' && p.name === name);
    if (declared === undefined) problems.push(`${label}: path parameter ${name} is not declared`);
    else if (declared.schema?.type === 'integer' && !/^\d+$/.test(values[i] ?? ''))
      problems.push(`${label}: path parameter ${name} must be an integer`);
  });

  for (const [key, value] of request.query) {
    const declared = parameters.find((p) => p.in === 'query' && p.name === key);
    if (declared === undefined) {
      problems.push(`${label}: query parameter ${key} is not declared by ${operation.operationId}`);
      continue;
    }
    if (declared.schema?.type === 'integer' && !/^\d+$/.test(value))
      problems.push(`${label}: query parameter ${key}=${value} must be an integer`);
    if (declared.schema?.enum !== undefined && !declared.schema.enum.includes(value))
      problems.push(`${label}: query parameter ${key}=${value} is not one of its values`);
  }
  for (const p of parameters) {
    if (p.in === 'query' && p.required === true && !request.query.has(p.name))
      problems.push(`${label}: required query parameter ${p.name} is missing`);
  }

  const schema = operation.requestBody?.content?.['application/json']?.schema;
  if (request.body !== undefined) {
    if (schema === undefined) {
      problems.push(`${label}: ${operation.operationId} takes no JSON body`);
    } else if (typeof request.body !== 'object' || request.body === null) {
      problems.push(`${label}: the body must be a JSON object`);
    } else {
      const body = request.body as Record<string, unknown>;
      for (const [key, value] of Object.entries(body)) {
        const property = schema.properties?.[key];
        if (property === undefined)
          problems.push(`${label}: body field ${key} is not in ${operation.operationId}`);
        else if (!primitiveOk(value, property.type))
          problems.push(`${label}: body field ${key} must be ${String(property.type)}`);
      }
      for (const key of schema.required ?? []) {
        if (!(key in body)) problems.push(`${label}: required body field ${key} is missing`);
      }
    }
  }
  return problems;
}
