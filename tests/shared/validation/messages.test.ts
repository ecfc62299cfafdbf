import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { benchBodySchema } from '../../../shared/schemas/bench';
import { plugCompareBodySchema } from '../../../shared/schemas/compat';
import { fitReportBodySchema } from '../../../shared/schemas/fit-reports';
import { engineSpecSchema, PLUG_ELECTRODES } from '../../../shared/schemas/specs';
import { text } from '../../../shared/schemas/text';
import { inviteBodySchema } from '../../../shared/schemas/users';
import { fieldIssues, fieldSentence } from '../../../shared/validation/field-issues';
import { plainWords } from '../../../shared/validation/plain-words';

/** What the API would say: each issue as `{ field, message }` and as the sentence of the 400's message. */
function said(schema: z.ZodType, input: unknown): { field: string; message: string; sentence: string }[] {
  const result = schema.safeParse(input, { error: plainWords });
  if (result.success) return [];
  return fieldIssues(result.error).map((i) => ({ ...i, sentence: fieldSentence(i) }));
}

const UUID = '00000000-0000-4000-8000-000000000000';
const PLUG = {
  threadMm: 14,
  threadPitchMm: 1.25,
  reachMm: 19,
  seat: 'flat',
  hexMm: 16,
  gapMm: 0.8,
  regappable: true,
  resistor: true,
  projectedTip: true,
  electrode: 'iridium',
  heatStep: 6,
};

describe('validation messages in plain words', () => {
  it('names the field and the bound: "compressionRatio must be at least 4"', () => {
    const engine = {
      code: 'K1',
      displacementL: 2,
      cylinders: 4,
      compressionRatio: 3,
      aspiration: 'natural',
      specGapMm: 1,
      dwellMs: 3,
      crankingDwellMs: 4,
    };
    expect(said(engineSpecSchema, engine)).toEqual([
      { field: 'compressionRatio', message: 'must be at least 4', sentence: 'compressionRatio must be at least 4' },
    ]);
    expect(said(engineSpecSchema, { ...engine, compressionRatio: 10, displacementL: 0 })[0]!.sentence).toBe(
      'displacementL must be more than 0',
    );
    expect(said(engineSpecSchema, { ...engine, compressionRatio: 10, cylinders: 4.5 })[0]!.sentence).toBe(
      'cylinders must be a whole number',
    );
  });

  it('inside a union, reports the branch the input took: the spec typed in, not "substitute: Invalid input"', () => {
    const body = { original: { partId: UUID }, substitute: { spec: { ...PLUG, electrode: 'gold' } }, engine: { engineId: UUID } };
    expect(said(plugCompareBodySchema, body)).toEqual([
      {
        field: 'substitute.spec.electrode',
        message: `must be one of ${PLUG_ELECTRODES.join(', ')}`,
        sentence: 'substitute.spec.electrode must be one of copper, platinum, iridium, fine-wire-platinum, fine-wire-iridium',
      },
    ]);
    // And a part given by a malformed id is judged as a part, not as a spec that is missing.
    expect(said(plugCompareBodySchema, { ...body, substitute: { partId: 'not-a-uuid' } })).toEqual([
      { field: 'substitute.partId', message: 'must be an id (a UUID)', sentence: 'substitute.partId must be an id (a UUID)' },
    ]);
  });

  it('in a union of open objects, the branch whose fields were sent wins', () => {
    const issues = said(benchBodySchema, { partId: UUID, measured: { primaryOhm: 0.6, temperatureC: -300 } });
    expect(issues.map((i) => i.sentence)).toEqual(['measured.temperatureC must be at least -40']);
  });

  it('a discriminator outside its values names the values', () => {
    expect(said(fitReportBodySchema, { kind: 'wire' })[0]!.sentence).toBe('kind must be one of coil, plug');
  });

  it('says "is required" for a missing field, and keeps a message a schema wrote itself after a colon', () => {
    expect(said(inviteBodySchema, { name: 'Robin', role: 'clerk' })[0]!.sentence).toBe('email is required');
    const technician = said(inviteBodySchema, { email: 'robin@harborlane.test', name: 'Robin', role: 'technician' });
    expect(technician.map((i) => i.sentence)).toEqual(['shopId: a technician belongs to a shop: choose one']);
  });

  it('trims text, refuses blank text and control characters, and lets a note keep its line breaks', () => {
    const name = text({ min: 1, max: 20 });
    expect(name.parse('  Robin  ')).toBe('Robin');
    expect(said(name, '   ')[0]!.sentence).toBe('(body) must not be blank');
    expect(said(name, 'Ro\u0000bin')[0]!.message).toBe('must not contain control characters');
    expect(said(name, 'Ro\nbin')[0]!.message).toBe('must not contain control characters');
    const note = text({ max: 100, multiline: true });
    expect(note.parse('line one\n\tline two')).toBe('line one\n\tline two');
    expect(said(note, 'bell\u0007')[0]!.message).toBe('must not contain control characters other than tabs and line breaks');
    expect(said(note, 'x'.repeat(101))[0]!.message).toBe('must be at most 100 characters long');
  });
});
