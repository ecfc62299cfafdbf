import type { CoilSpec, PartKind, PlugSpec, ResolvedPlugSpec } from '@shared/schemas/specs';
import { COIL_SPEC_FIELDS, PLUG_SPEC_FIELDS, specLabel, type SpecFieldDef } from '@shared/spec-fields';

/**
 * The spec of a catalog part as the buyer types it: one field per stored spec field of
 * shared/schemas/specs.ts, each with its unit. A plug's heat is its brand's own heat code, chosen
 * from the brand's heat table (the server maps it onto the heat step). The forms check it with
 * the schema the API validates with (coilSpecSchema, plugSpecSchema).
 */

export type ShownSpec = CoilSpec | ResolvedPlugSpec;

/** A spec as the part bodies carry it: under `coil` or under `plug`. */
export type SpecBody = { coil: CoilSpec } | { plug: PlugSpec };

/** A stored plug spec names its brand's heat code; the heat step follows from the brand's table. */
export const specFieldsFor = (kind: PartKind): readonly SpecFieldDef[] =>
  kind === 'coil' ? COIL_SPEC_FIELDS : PLUG_SPEC_FIELDS.filter((f) => f.name !== 'heatStep');

/**
 * The values a spec form starts from: the spec on file, or selects on their first choice,
 * tick boxes off and the rest empty.
 */
export function specStartValues(kind: PartKind, spec: ShownSpec | null): Record<string, unknown> {
  const values: Record<string, unknown> = {};
  const record = (spec ?? {}) as Record<string, unknown>;
  for (const f of specFieldsFor(kind)) {
    const v = record[f.name];
    if (v !== undefined) values[f.name] = v;
    else if (f.input === 'select') values[f.name] = f.options?.[0];
    else if (f.input === 'checkbox') values[f.name] = false;
  }
  return values;
}

export { formatSpecValue as specFigure } from '@shared/spec-fields';
export { specLabel };
