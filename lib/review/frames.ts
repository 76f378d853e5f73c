// Which frames to keep ready around the cursor, and a least-recently-used store for them.

export const clampFrame = (n: number, frameCount: number) => Math.min(Math.max(Math.round(n), 0), Math.max(frameCount - 1, 0));

/** Frames within `radius` of `cursor`, nearest first, ahead before behind (stepping forward is the common case). */
export function preloadOrder(cursor: number, frameCount: number, radius: number): number[] {
  const order: number[] = [];
  const add = (n: number) => {
    if (n >= 0 && n < frameCount) order.push(n);
  };
  add(cursor);
  for (let d = 1; d <= radius; d++) {
    add(cursor + d);
    add(cursor - d);
  }
  return order;
}

/** Milliseconds since frame 0 at the camera's capture rate. */
export const frameTimeMs = (frame: number, captureFps: number) => (captureFps > 0 ? (frame * 1000) / captureFps : 0);

export class LruCache<K, V> {
  private readonly map = new Map<K, V>();
  constructor(private readonly capacity: number, private readonly onEvict?: (key: K, value: V) => void) {}

  get(key: K): V | undefined {
    const v = this.map.get(key);
    if (v !== undefined) {
      this.map.delete(key);
      this.map.set(key, v);
    }
    return v;
  }

  /** Looks without counting as a use. */
  peek(key: K): V | undefined {
    return this.map.get(key);
  }

  has(key: K) {
    return this.map.has(key);
  }

  set(key: K, value: V) {
    this.map.delete(key);
    this.map.set(key, value);
    while (this.map.size > this.capacity) {
      const [oldest, old] = this.map.entries().next().value as [K, V];
      this.map.delete(oldest);
      this.onEvict?.(oldest, old);
    }
  }

  get size() {
    return this.map.size;
  }

  keys(): K[] {
    return [...this.map.keys()];
  }
}
