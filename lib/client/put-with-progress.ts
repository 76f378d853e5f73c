// A PUT of a file to a presigned URL with upload progress (fetch cannot report it).
export type PutHandle = { done: Promise<void>; abort: () => void };

export function putWithProgress(url: string, file: Blob, headers: Record<string, string>, onProgress: (fraction: number) => void): PutHandle {
  const xhr = new XMLHttpRequest();
  const done = new Promise<void>((resolve, reject) => {
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => (xhr.status >= 200 && xhr.status < 300 ? resolve() : reject(new Error(`The store refused the file (${xhr.status})`)));
    xhr.onerror = () => reject(new Error("The connection to the store failed"));
    xhr.onabort = () => reject(new DOMException("Cancelled", "AbortError"));
  });
  xhr.open("PUT", url);
  for (const [k, v] of Object.entries(headers)) xhr.setRequestHeader(k, v);
  xhr.send(file);
  return { done, abort: () => xhr.abort() };
}
