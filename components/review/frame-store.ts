// Decoded frame images for one clip, loaded ahead of the cursor and kept in an LRU store so
// stepping never waits on the network or the JPEG decoder. Browser-only (Image, ImageBitmap).
import { LruCache, preloadOrder } from "@/lib/review/frames";

type Entry = { img: HTMLImageElement; bitmap: ImageBitmap | null };
const PRELOAD_RADIUS = 12;
const MEMORY_BUDGET_BYTES = 400 * 1024 * 1024;

export class FrameStore {
  private readonly cache: LruCache<number, Entry>;
  private readonly listeners = new Set<(frame: number) => void>();

  constructor(private readonly clipId: string, private readonly frameCount: number, width: number, height: number) {
    const perFrame = Math.max(width * height * 4, 1);
    const capacity = Math.max(2 * PRELOAD_RADIUS + 6, Math.min(200, Math.floor(MEMORY_BUDGET_BYTES / perFrame)));
    this.cache = new LruCache(capacity, (_, e) => {
      e.img.onload = null;
      e.bitmap?.close();
    });
  }

  url = (n: number) => `/api/clips/${this.clipId}/frames/${n}`;

  /** The decoded frame, or null while it is still on its way. */
  get(n: number): ImageBitmap | null {
    return this.cache.get(n)?.bitmap ?? null;
  }

  /** Calls back with the frame number each time a frame becomes ready. */
  subscribe(listener: (frame: number) => void) {
    this.listeners.add(listener);
    return () => void this.listeners.delete(listener);
  }

  /** Loads the frames around `cursor`, nearest first; touches those already here. */
  preloadAround(cursor: number) {
    for (const n of preloadOrder(cursor, this.frameCount, PRELOAD_RADIUS)) {
      if (this.cache.has(n)) {
        this.cache.get(n);
        continue;
      }
      const entry: Entry = { img: new Image(), bitmap: null };
      entry.img.onload = () => {
        createImageBitmap(entry.img)
          .then((bitmap) => {
            if (this.cache.peek(n) !== entry) return bitmap.close();
            entry.bitmap = bitmap;
            for (const l of this.listeners) l(n);
          })
          .catch(() => undefined);
      };
      entry.img.src = this.url(n);
      this.cache.set(n, entry);
    }
  }
}
