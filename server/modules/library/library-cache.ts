/**
 * A small read cache of things that change only with the library (spec cards, a model's
 * parts): bounded, each entry trusted for at most `ttlMs`, emptied whenever this process
 * changes the library (onLibraryChanged), and never filled with a read that a write may
 * have overtaken. Callers drop entries for other processes' changes from the library
 * follower (entry by entry, or all at once). Cached values are shared: nothing may change them.
 */
import { libraryGeneration, onLibraryChanged } from './library-changes';
import { libraryFollower } from './library-follower';

export class LibraryCache<K, V> {
  private readonly entries = new Map<K, { value: V; at: number }>();

  constructor(
    private readonly ttlMs: number,
    private readonly max: number,
  ) {
    onLibraryChanged(() => this.entries.clear());
  }

  async get(key: K, load: () => Promise<V>): Promise<V> {
    libraryFollower.start();
    const hit = this.entries.get(key);
    if (hit && Date.now() - hit.at < this.ttlMs) return hit.value;
    const generation = libraryGeneration();
    const value = await load();
    // A write that landed while this read was under way may not be in it: do not keep it.
    if (generation === libraryGeneration()) {
      if (this.entries.size >= this.max) this.entries.delete(this.entries.keys().next().value!);
      this.entries.set(key, { value, at: Date.now() });
    }
    return value;
  }

  delete(key: K) {
    this.entries.delete(key);
  }

  clear() {
    this.entries.clear();
  }
}
