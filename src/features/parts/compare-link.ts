/** The Compare page's address for an original and a substitute, judged on an engine when one is known. */
export function compareHref(originalPartId: string, substitutePartId: string, engineId?: string | null): string {
  const params = new URLSearchParams({ original: originalPartId, substitute: substitutePartId });
  if (engineId) params.set('engine', engineId);
  return `/compare?${params}`;
}
