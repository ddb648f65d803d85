import type { z } from "zod";
import { AppError, groupFieldErrors } from "@/lib/errors";
import type { DesignProblem } from "./to-engine";

const IDENTIFIER = /^[A-Za-z_$][\w$]*$/;

/** ["runs", 2, "size"] → "runs[2].size", the way an integrator points at a field of the JSON they sent. */
export function jsonPath(path: readonly PropertyKey[]): string {
  return path.reduce<string>((out, key) => {
    if (typeof key === "number") return `${out}[${key}]`;
    const name = String(key);
    if (!IDENTIFIER.test(name)) return `${out}[${JSON.stringify(name)}]`;
    return out ? `${out}.${name}` : name;
  }, "");
}

/** zod issues as problems with JSON paths; each unknown key becomes its own problem so a misspelt field is named. */
export function problemsOfZod(error: z.ZodError): DesignProblem[] {
  return error.issues.flatMap((issue) =>
    issue.code === "unrecognized_keys"
      ? issue.keys.map((key) => ({
          path: jsonPath([...issue.path, key]),
          message: "Unknown field; check its spelling against the document format",
        }))
      : [{ path: jsonPath(issue.path), message: issue.message }],
  );
}

/** A 422 naming every problem by its path, in the shape every API error has. */
export function problemsError(message: string, problems: DesignProblem[]): AppError {
  return new AppError("INVALID_INPUT", message, groupFieldErrors(problems.map((p) => [p.path, p.message] as const)));
}
