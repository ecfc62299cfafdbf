import type { z } from 'zod';
import type { FieldIssue } from '../schemas/error';

/** The field an issue of the whole request part is filed under. */
export const WHOLE_BODY = '(body)';

type Issue = z.core.$ZodIssue;

/**
 * "substitute.electrode must be one of copper, …": a phrase of `plainWords` reads on from the
 * field's name; a message a schema wrote itself ("a technician belongs to a shop") follows a colon.
 */
export function fieldSentence({ field, message }: FieldIssue): string {
  return readsOnFromField(message) ? `${field} ${message}` : `${field}: ${message}`;
}

/** Whether a message is a phrase of `plainWords` that reads on from the field's name ("must be at least 5"). */
export const readsOnFromField = (message: string): boolean => /^(must|is|does|holds) /.test(message);

/**
 * A failed parse as the API reports it: one `{ field, message }` per problem, the field as a
 * dotted path. A union that matched no branch is reported by the branch the input was closest
 * to, so the answer is "substitute.spec.reachMm must be more than 0", not "substitute: invalid".
 */
export function fieldIssues(error: { issues: readonly Issue[] }, root = WHOLE_BODY): FieldIssue[] {
  const out: FieldIssue[] = [];
  const seen = new Set<string>();
  const walk = (issues: readonly Issue[], prefix: readonly PropertyKey[]) => {
    for (const issue of issues) {
      const path = [...prefix, ...issue.path];
      if (issue.code === 'invalid_union' && issue.errors.length > 0) {
        walk(closestBranch(issue.errors), path);
        continue;
      }
      const field = path.length ? path.map(String).join('.') : root;
      const key = `${field}\u0000${issue.message}`;
      if (seen.has(key)) continue;
      seen.add(key);
      out.push({ field, message: issue.message });
    }
  };
  walk(error.issues, []);
  return out;
}

/**
 * The branch whose shape the input had: fewest issues about the shape itself (the value's type,
 * a field it does not take, a top-level field missing or of the wrong type), then fewest issues.
 * `{ spec: {…} }` sent where `{ partId } | { spec }` is expected is judged as a spec.
 */
function closestBranch(branches: readonly (readonly Issue[])[]): readonly Issue[] {
  const shapeMisses = (issues: readonly Issue[]) =>
    issues.filter((i) => i.path.length === 0 || (i.path.length === 1 && i.code === 'invalid_type')).length;
  let best = branches[0]!;
  for (const branch of branches.slice(1)) {
    const d = shapeMisses(branch) - shapeMisses(best);
    if (d < 0 || (d === 0 && branch.length < best.length)) best = branch;
  }
  return best;
}
