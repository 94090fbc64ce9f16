import { LRUCache } from 'lru-cache'

export interface StoredPage { json: string, etag: string }

interface Entry extends StoredPage { farmId: number }

// Answers kept per key, droppable per farm or all at once, bounded in bytes and age. A load that
// overlaps a drop must not be kept: `begin` before loading hands out a ticket that `keep` checks,
// so a page read before a commit is never stored after the drop that the commit caused.
export class PageStore {
  #generation = 0
  #farmGenerations = new Map<number, number>()
  // Keys of each farm's pages, so a farm's drop does not scan every farm's.
  #farmKeys = new Map<number, Set<string>>()
  #pages: LRUCache<string, Entry>
  // Loads under way, by ticket and key: requests that miss together after a drop share one load
  // instead of each going to the database; a request after a later drop gets a load of its own.
  #loading = new Map<string, Promise<StoredPage>>()

  constructor(opts: { maxBytes: number, ttlMs: number, maxEntryBytes: number }) {
    this.#pages = new LRUCache<string, Entry>({
      maxSize: opts.maxBytes,
      ttl: opts.ttlMs,
      maxEntrySize: opts.maxEntryBytes,
      // Strings are UTF-16 in V8: two bytes a character, plus the entry's own overhead.
      sizeCalculation: (page, key) => (page.json.length + page.etag.length + key.length) * 2 + 64,
      dispose: (page, key) => {
        const keys = this.#farmKeys.get(page.farmId)
        keys?.delete(key)
        if (keys?.size === 0) this.#farmKeys.delete(page.farmId)
      },
    })
  }

  get(key: string): StoredPage | undefined {
    return this.#pages.get(key)
  }

  begin(farmId: number): string {
    return `${this.#generation}:${this.#farmGenerations.get(farmId) ?? 0}`
  }

  // Keeps the page unless a drop touching its farm happened since `ticket` was taken.
  keep(ticket: string, farmId: number, key: string, page: StoredPage): boolean {
    if (ticket !== this.begin(farmId)) return false
    this.#pages.set(key, { ...page, farmId })
    if (!this.#pages.has(key)) return false
    let keys = this.#farmKeys.get(farmId)
    if (!keys) this.#farmKeys.set(farmId, keys = new Set())
    keys.add(key)
    return true
  }

  // The kept page, or one load shared by every caller that asks for the key before it settles.
  // `mayKeep` is asked once the load is done (the change feed may have gone down meanwhile).
  async fetch(farmId: number, key: string, load: () => Promise<StoredPage>, mayKeep: () => boolean = () => true): Promise<StoredPage> {
    const hit = this.get(key)
    if (hit) return hit
    const ticket = this.begin(farmId)
    const flight = `${ticket}|${key}`
    let pending = this.#loading.get(flight)
    if (!pending) {
      pending = load().then((page) => {
        if (mayKeep()) this.keep(ticket, farmId, key, page)
        return page
      })
      this.#loading.set(flight, pending)
      const done = () => this.#loading.delete(flight)
      pending.then(done, done)
    }
    return pending
  }

  forget(farmId?: number) {
    if (farmId === undefined) {
      this.#generation++
      this.#pages.clear()
      return
    }
    this.#farmGenerations.set(farmId, (this.#farmGenerations.get(farmId) ?? 0) + 1)
    for (const key of [...this.#farmKeys.get(farmId) ?? []]) this.#pages.delete(key)
  }

  get size() {
    return this.#pages.size
  }

  get bytes() {
    return this.#pages.calculatedSize
  }
}
