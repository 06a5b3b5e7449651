/**
 * The JSON Schema (2020-12, the dialect of OpenAPI 3.1) of a request body, generated from the zod schema
 * the route parses it with (zod 4's z.toJSONSchema, input side), with the prose laid over it by property
 * path. So fields, types, bounds, enums and what is required come from the one schema; only descriptions,
 * examples and defaults are written by hand. A prose entry for a path the schema does not have throws, so
 * that prose cannot outlive its field.
 */
import { z } from "zod";
import { idRecordValues } from "../engine/idRecordSchema";

export type JsonSchema = Record<string, unknown>;

/**
 * Hand-written words by property path: "condition.T_K", "questions[].kind" (`[]` for the items of an
 * array). A path through a union applies to every alternative that has the property.
 */
export type Prose = Record<string, { description?: string; default?: unknown; examples?: unknown[] }>;

export interface JsonSchemaOptions {
  /** words laid over the generated schema; default none */
  prose?: Prose;
  /** schemas written as a $ref to a component where they appear inside this one, e.g. the condition; default none */
  refs?: Map<z.core.$ZodType, string>;
}

export function jsonSchemaOf(schema: z.ZodType, options: JsonSchemaOptions = {}): JsonSchema {
  const refs = options.refs ?? new Map<z.core.$ZodType, string>();
  const json = z.toJSONSchema(schema, {
    io: "input",
    unrepresentable: "any",
    override: ({ zodSchema, jsonSchema, path }) => {
      const value = idRecordValues.get(zodSchema);
      if (value) {
        replace(jsonSchema, {
          type: "object",
          additionalProperties: jsonSchemaOf(value, { refs }),
          description: "keyed by the mechanism's ids",
        });
        return;
      }
      const ref = refs.get(zodSchema);
      if (ref && path.length > 0) replace(jsonSchema, { $ref: `#/components/schemas/${ref}` });
    },
  }) as JsonSchema;
  delete json.$schema;
  for (const [path, words] of Object.entries(options.prose ?? {})) {
    const nodes = nodesAt(json, path);
    if (nodes.length === 0) throw new Error(`jsonSchemaOf: prose for ${path}, which the schema does not have`);
    for (const node of nodes) Object.assign(node, words);
  }
  return json;
}

function replace(target: Record<string, unknown>, by: JsonSchema): void {
  for (const k of Object.keys(target)) delete target[k];
  Object.assign(target, by);
}

/** The schema nodes at a dotted property path, through unions (oneOf/anyOf) and array items (`name[]`). */
function nodesAt(root: JsonSchema, path: string): JsonSchema[] {
  let nodes = [root];
  for (const segment of path.split(".")) {
    const items = segment.endsWith("[]");
    const name = items ? segment.slice(0, -2) : segment;
    nodes = nodes
      .flatMap(alternatives)
      .map((n) => (n.properties as Record<string, JsonSchema> | undefined)?.[name])
      .filter((n): n is JsonSchema => n !== undefined)
      .map((n) => (items ? (n.items as JsonSchema) : n))
      .filter((n) => n !== undefined);
  }
  return nodes;
}

const alternatives = (n: JsonSchema): JsonSchema[] => [
  n,
  ...((n.oneOf ?? n.anyOf ?? []) as JsonSchema[]).flatMap(alternatives),
];
