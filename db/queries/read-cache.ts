import { LRUCache } from "lru-cache";

/**
 * Cached reads that any write makes stale.
 *
 * Every write transaction in this process bumps one counter (see serial-write.ts); a cached read
 * is kept with the counter's value when it was loaded and is used only while the counter still
 * has that value. So nothing cached outlives a write, whichever table the write touched, and no
 * cache needs to know which tables its read depends on. Reads far outnumber writes in a studio,
 * which is what makes this pay. It assumes this process is the only writer of the database, as
 * the write queue does.
 *
 * The state lives on globalThis so route handlers and pages, bundled apart, share it.
 */
type Entry = { generation: number; value: Promise<unknown> };
type State = { generation: number; caches: Map<string, LRUCache<string, Entry>> };

const globalState = globalThis as unknown as { mottleReadCache?: State };
const state = (globalState.mottleReadCache ??= { generation: 0, caches: new Map() });

/** Called after every write: every cached read is stale from now on. */
export function markWritten() {
  state.generation += 1;
}

/**
 * A bounded cache of one kind of read. Concurrent misses for one key share one load; a failed
 * load is not kept; a load that a write overtook is not kept either.
 */
export function readCache<V>(name: string, max: number) {
  let cache = state.caches.get(name);
  if (!cache) {
    cache = new LRUCache<string, Entry>({ max });
    state.caches.set(name, cache);
  }
  const entries = cache;
  return function cached(key: string, load: () => Promise<V>): Promise<V> {
    const generation = state.generation;
    const hit = entries.get(key);
    if (hit && hit.generation === generation) return hit.value as Promise<V>;
    const value = load();
    entries.set(key, { generation, value });
    value.then(
      () => {
        if (state.generation !== generation && entries.get(key)?.value === value) entries.delete(key);
      },
      () => {
        if (entries.get(key)?.value === value) entries.delete(key);
      },
    );
    return value;
  };
}
