/**
 * One signal for "the library changed": every write path (import commit, spec edit,
 * revert, accepted correction) calls markLibraryChanged(), and the in-memory read
 * caches (search index, spec cards) listen to it.
 */
let generation = 0;
const listeners = new Set<() => void>();

export function markLibraryChanged() {
  generation += 1;
  for (const listener of listeners) listener();
}

export const libraryGeneration = () => generation;

export function onLibraryChanged(listener: () => void) {
  listeners.add(listener);
}
