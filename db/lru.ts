/**
 * A bounded least-recently-used map: a `Map` keeps insertion order, so a hit is moved to the end
 * and the first key is the one to drop. Used for content that never changes once written (a
 * revision's table), where a cached copy can never be stale, on one server or on several.
 */
export class Lru<K, V> {
  private readonly entries = new Map<K, V>()

  constructor(readonly maxEntries: number) {
    if (!Number.isInteger(maxEntries) || maxEntries < 1) throw new RangeError(`maxEntries must be a positive integer, got ${maxEntries}`)
  }

  get size(): number {
    return this.entries.size
  }

  get(key: K): V | undefined {
    const v = this.entries.get(key)
    if (v === undefined) return undefined
    this.entries.delete(key)
    this.entries.set(key, v)
    return v
  }

  set(key: K, value: V): void {
    this.entries.delete(key)
    this.entries.set(key, value)
    if (this.entries.size > this.maxEntries) this.entries.delete(this.entries.keys().next().value as K)
  }

  /** The cached value, or the one `load` gives (cached unless undefined). */
  async getOrLoad(key: K, load: () => Promise<V | undefined>): Promise<V | undefined> {
    const hit = this.get(key)
    if (hit !== undefined) return hit
    const v = await load()
    if (v !== undefined) this.set(key, v)
    return v
  }
}

/**
 * One cache per owner (a database handle) and name. The registry sits on globalThis because Next
 * loads route handlers and pages as separate module copies, which would otherwise each hold their
 * own; keying by the handle means a database opened anew (tests open one per file) starts empty.
 */
export function lruFor<K, V>(owner: object, name: string, maxEntries: number): Lru<K, V> {
  const g = globalThis as typeof globalThis & { [registryKey]?: WeakMap<object, Map<string, Lru<unknown, unknown>>> }
  const byOwner = (g[registryKey] ??= new WeakMap())
  let named = byOwner.get(owner)
  if (!named) byOwner.set(owner, (named = new Map()))
  let lru = named.get(name) as Lru<K, V> | undefined
  if (!lru) named.set(name, (lru = new Lru<K, V>(maxEntries)) as Lru<unknown, unknown>)
  return lru
}

const registryKey = Symbol.for('mapwright.lru-registry')
