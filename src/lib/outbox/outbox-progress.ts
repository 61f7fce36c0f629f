/** Upload progress lives in memory: writing every percent to IndexedDB would be wasted work. */
const progress = new Map<string, number>();
const listeners = new Set<() => void>();

export function setProgress(id: string, fraction: number | undefined) {
  if (fraction === undefined) progress.delete(id);
  else progress.set(id, fraction);
  listeners.forEach((l) => l());
}

export const progressOf = (id: string) => progress.get(id);

export function onProgress(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}
