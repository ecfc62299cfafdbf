import { useCallback, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { CoilCompareBody, CoilRef, PlugCompareBody, PlugRef } from '@shared/schemas/compat';
import { PART_KINDS, type PartKind } from '@shared/schemas/specs';
import { usePart } from '@/features/parts/api/get-part';
import { useEngine } from '@/features/vehicles/api/get-engine';
import type { TypedSpec } from './components/spec-form';

export type CompareRequest = { kind: 'coil'; body: CoilCompareBody } | { kind: 'plug'; body: PlugCompareBody };

type Side = { partId: string } | TypedSpec;
type SideName = 'original' | 'substitute';

const isKind = (v: string | null): v is PartKind => v !== null && (PART_KINDS as readonly string[]).includes(v);

function coilRef(side: Side | null): CoilRef | null {
  if (!side) return null;
  if ('partId' in side) return { partId: side.partId };
  return side.kind === 'coil' ? { spec: side.spec } : null;
}
function plugRef(side: Side | null): PlugRef | null {
  if (!side) return null;
  if ('partId' in side) return { partId: side.partId };
  return side.kind === 'plug' ? { spec: side.spec } : null;
}

function buildRequest(kind: PartKind, engineId: string | null, original: Side | null, substitute: Side | null): CompareRequest | null {
  if (!engineId) return null;
  const engine = { engineId };
  if (kind === 'coil') {
    const o = coilRef(original);
    const s = coilRef(substitute);
    return o && s ? { kind, body: { original: o, substitute: s, engine } } : null;
  }
  const o = plugRef(original);
  const s = plugRef(substitute);
  return o && s ? { kind, body: { original: o, substitute: s, engine } } : null;
}

/**
 * What is being compared. Catalog parts and the engine live in the address
 * (`?kind=&engine=&original=&substitute=`, the way the Counter links here), so a comparison can
 * be bookmarked and the back button works; typed-in specs live in the page. Without a kind the
 * original part's kind is used; without an original the engine's fitted part of that kind is.
 */
export function useCompareSelection() {
  const [params, setParams] = useSearchParams();
  const [typed, setTyped] = useState<Record<SideName, TypedSpec | null>>({ original: null, substitute: null });
  const kindParam = params.get('kind');
  const originalParam = params.get('original');
  const substituteParam = params.get('substitute');
  const engineId = params.get('engine');

  const inferFrom = isKind(kindParam) ? null : (originalParam ?? substituteParam);
  const inferred = usePart(inferFrom);
  const kindPending = inferFrom !== null && inferred.isPending;
  const kind: PartKind = isKind(kindParam) ? kindParam : (inferred.data?.part.kind ?? 'coil');

  const engine = useEngine(engineId);
  const fittedPartId = engine.data?.fitments.find((f) => f.part.kind === kind)?.part.id ?? null;
  const originalPartId = originalParam ?? fittedPartId;

  const typedOf = (side: SideName): TypedSpec | null => (typed[side]?.kind === kind ? typed[side] : null);
  const sideOf = (side: SideName, partId: string | null): Side | null => typedOf(side) ?? (partId ? { partId } : null);
  const original = sideOf('original', originalPartId);
  const originalPart = usePart(typedOf('original') ? null : originalPartId);
  const substitute = sideOf('substitute', substituteParam);

  const update = useCallback(
    (change: (next: URLSearchParams) => void) => {
      setParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          change(next);
          return next;
        },
        { replace: true },
      );
    },
    [setParams],
  );

  const setKind = (next: PartKind) => {
    if (next === kind) return;
    update((p) => {
      p.set('kind', next);
      p.delete('original');
      p.delete('substitute');
    });
    setTyped({ original: null, substitute: null });
  };
  const setEngine = (id: string) => update((p) => p.set('engine', id));
  const pickPart = (side: SideName, partId: string) => {
    update((p) => {
      p.set(side, partId);
      p.set('kind', kind);
    });
    setTyped((t) => ({ ...t, [side]: null }));
  };
  const typeSpec = (side: SideName, spec: TypedSpec) => setTyped((t) => ({ ...t, [side]: spec }));
  const clearSpec = (side: SideName) => setTyped((t) => ({ ...t, [side]: null }));
  const swap = () => {
    const o = typedOf('original');
    const s = typedOf('substitute');
    update((p) => {
      p.set('kind', kind);
      if (substituteParam) p.set('original', substituteParam);
      else p.delete('original');
      if (originalPartId) p.set('substitute', originalPartId);
      else p.delete('substitute');
    });
    setTyped({ original: s, substitute: o });
  };

  return {
    kind,
    kindPending,
    engineId,
    fittedPartId,
    originalPartId,
    substitutePartId: substituteParam,
    typedOriginal: typedOf('original'),
    typedSubstitute: typedOf('substitute'),
    /** The original's spec, to start a typed-in substitute from. */
    originalSpec: typedOf('original')?.spec ?? originalPart.data?.spec ?? null,
    request: kindPending ? null : buildRequest(kind, engineId, original, substitute),
    canSwap: original !== null && substitute !== null,
    setKind,
    setEngine,
    pickPart,
    typeSpec,
    clearSpec,
    swap,
  };
}
