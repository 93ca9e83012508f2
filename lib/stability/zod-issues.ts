/**
 * Converts zod's shape errors into the engine's Issue form (code, path, message), with
 * messages that say which key is wrong and what it should be.
 */
import type { z } from "zod";
import { issue, joinPath, type Issue } from "./issues";

/** Maps zod issues to Issues; paths read like `regions[2].points[4]`. */
export function fromZodIssues(issues: ReadonlyArray<z.core.$ZodIssue>): Issue[] {
  return issues.map((zi) => {
    const path = joinPath(zi.path);
    const where = path === "" ? "The document" : path;
    const raw = zi as unknown as Record<string, unknown>;
    switch (zi.code) {
      case "invalid_type": {
        const expected = String(raw.expected ?? "a value");
        const got = /received (\w+)/.exec(zi.message)?.[1];
        if (got === "undefined") return issue("missing-key", path, `${where} is missing: give ${article(expected)}.`);
        return issue("wrong-type", path, `${where} must be ${article(expected)}${got ? `, not ${got}` : ""}.`);
      }
      case "invalid_union": {
        const options = raw.options as unknown[] | undefined;
        if (options)
          return issue(
            "unknown-option",
            path,
            `${where} must be one of ${options.map((o) => `"${String(o)}"`).join(", ")}.`,
          );
        return issue("invalid-value", path, `${where} does not match any allowed form: ${zi.message}.`);
      }
      case "invalid_value": {
        const values = raw.values as unknown[] | undefined;
        return issue(
          "invalid-value",
          path,
          `${where} must be ${values ? values.map((v) => JSON.stringify(v)).join(" or ") : "a listed value"}.`,
        );
      }
      case "too_small":
      case "too_big":
        return issue("out-of-range", path, `${where}: ${zi.message}.`);
      default:
        return issue("invalid-value", path, `${where}: ${zi.message}.`);
    }
  });
}

function article(t: string): string {
  return /^[aeiou]/i.test(t) ? `an ${t}` : `a ${t}`;
}
