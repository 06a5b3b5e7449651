/**
 * A zod schema for an object keyed by user ids (species, pools, channels).
 * `z.record` copies into a plain object, where an id `__proto__` is dropped
 * and `constructor` reads an Object member; this one validates each value and
 * returns a null-prototype record with every own key kept.
 */
import { z } from "zod";
import { type IdRecord, idRecord } from "../idRecord";

/** The value schema of every id-keyed record schema, for the OpenAPI document (a custom schema has no JSON Schema). */
export const idRecordValues = new WeakMap<z.core.$ZodType, z.ZodType>();

export function idRecordSchema<T extends z.ZodType>(value: T) {
  const schema = z
    .custom<Record<string, unknown>>(
      (v) => typeof v === "object" && v !== null && !Array.isArray(v),
      "expected an object of id: value entries",
    )
    .transform((obj, ctx): IdRecord<z.output<T>> => {
      const out = idRecord<z.output<T>>();
      for (const [id, v] of Object.entries(obj)) {
        const r = value.safeParse(v);
        if (r.success) out[id] = r.data;
        else
          for (const issue of r.error.issues)
            ctx.addIssue({ code: "custom", message: issue.message, path: [id, ...issue.path] });
      }
      return out;
    });
  idRecordValues.set(schema, value);
  return schema;
}
