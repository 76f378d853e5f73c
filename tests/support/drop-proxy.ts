// A dropped connection on demand, for the uploader's tests: one proxy in front of the web app
// rewrites the store's address in its answers to a second proxy in front of the store, which
// forwards every request with the store's own Host (so presigned signatures still hold), counts
// the multipart parts the store took, and cuts chosen part uploads off half-way.
import http from "node:http";
import type { AddressInfo } from "node:net";

export type DropProxy = {
  apiUrl: string;
  /** Part number → how many uploads of it the store answered with 200. */
  storedParts: Map<number, number>;
  /** Part uploads cut off half-way (never forwarded to the store). */
  dropped: number[];
  close: () => Promise<void>;
};

const listen = (server: http.Server) =>
  new Promise<string>((resolve) => server.listen(0, "127.0.0.1", () => resolve(`http://127.0.0.1:${(server.address() as AddressInfo).port}`)));

const readBody = (req: http.IncomingMessage) =>
  new Promise<Buffer>((resolve, reject) => {
    const chunks: Buffer[] = [];
    req.on("data", (c: Buffer) => chunks.push(c)).on("end", () => resolve(Buffer.concat(chunks))).on("error", reject);
  });

/** `dropOnce`: part numbers whose first upload is cut off after half its bytes arrived. */
export async function startDropProxy(apiBase: string, storeBase: string, dropOnce: number[]): Promise<DropProxy> {
  const store = new URL(storeBase);
  const storedParts = new Map<number, number>();
  const dropped: number[] = [];
  const pending = new Set(dropOnce);

  const storeProxy = http.createServer((req, res) => {
    const url = new URL(req.url!, storeBase);
    const partNumber = Number(url.searchParams.get("partNumber") ?? 0);
    if (req.method === "PUT" && partNumber && pending.has(partNumber)) {
      pending.delete(partNumber);
      const half = Number(req.headers["content-length"] ?? 0) / 2;
      let seen = 0;
      req.on("data", (c: Buffer) => {
        seen += c.length;
        if (seen >= half && !req.socket.destroyed) {
          dropped.push(partNumber);
          req.socket.destroy();
        }
      });
      return;
    }
    void readBody(req).then((body) => {
      const upstream = http.request(
        { host: store.hostname, port: store.port, method: req.method, path: req.url, headers: { ...req.headers, host: store.host } },
        (answer) => {
          if (req.method === "PUT" && partNumber && answer.statusCode === 200) storedParts.set(partNumber, (storedParts.get(partNumber) ?? 0) + 1);
          res.writeHead(answer.statusCode ?? 502, answer.headers);
          answer.pipe(res);
        },
      );
      upstream.on("error", () => res.destroy());
      upstream.end(body);
    });
  });
  const storeUrl = await listen(storeProxy);

  const apiProxy = http.createServer((req, res) => {
    void readBody(req).then(async (body) => {
      const headers = Object.fromEntries(Object.entries(req.headers).filter(([k]) => !["host", "content-length", "connection"].includes(k))) as Record<string, string>;
      const answer = await fetch(new URL(req.url!, apiBase), { method: req.method, headers, body: body.length > 0 ? new Uint8Array(body) : undefined });
      const text = (await answer.text()).split(store.origin).join(storeUrl);
      res.writeHead(answer.status, { "content-type": answer.headers.get("content-type") ?? "application/json" });
      res.end(text);
    }).catch(() => res.destroy());
  });
  const apiUrl = await listen(apiProxy);

  const close = (server: http.Server) => new Promise<void>((resolve) => { server.closeAllConnections(); server.close(() => resolve()); });
  return { apiUrl, storedParts, dropped, close: async () => { await Promise.all([close(storeProxy), close(apiProxy)]); } };
}
