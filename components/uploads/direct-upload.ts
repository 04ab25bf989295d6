"use client";
// A file goes from the browser straight to storage: the app announces it and
// hands back a presigned URL, the browser PUTs the bytes there (XMLHttpRequest,
// for its progress events), then tells the app it is done so that the server
// checks what arrived.

export type TUploadTarget = { url: string; method: "PUT"; headers: Record<string, string> };
export class UploadError extends Error {
  constructor(message: string, readonly retryable: boolean) {
    super(message);
  }
}

async function postJson(url: string, body?: unknown) {
  let res: Response;
  try {
    res = await fetch(url, { method: "POST", headers: body === undefined ? {} : { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
  } catch {
    throw new UploadError("No connection to the server: try again when the connection is back.", true);
  }
  const json = (await res.json().catch(() => ({}))) as { error?: { message?: string } } & Record<string, unknown>;
  if (!res.ok) throw new UploadError(json.error?.message ?? `The server refused the file (${res.status}).`, res.status >= 500 || res.status === 409);
  return json;
}

function put(target: TUploadTarget, file: Blob, onProgress: (fraction: number) => void, signal?: AbortSignal) {
  return new Promise<void>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(target.method, target.url);
    for (const [k, v] of Object.entries(target.headers)) xhr.setRequestHeader(k, v);
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => (xhr.status >= 200 && xhr.status < 300 ? resolve() : reject(new UploadError(xhr.status === 403 ? "The upload link was refused or has expired: try again." : `Storage refused the file (${xhr.status}).`, true)));
    xhr.onerror = () => reject(new UploadError("The connection dropped during the upload: try again.", true));
    xhr.onabort = () => reject(new UploadError("The upload was cancelled.", true));
    signal?.addEventListener("abort", () => xhr.abort());
    xhr.send(file);
  });
}

/** Announce → upload with progress → complete. Returns the completion's JSON; throws UploadError with a message to show. */
export async function uploadDirect<T>({ announceUrl, announceBody, completeUrl, file, onProgress, signal }: {
  announceUrl: string;
  announceBody: Record<string, unknown>;
  completeUrl: string;
  file: File;
  onProgress: (fraction: number) => void;
  signal?: AbortSignal;
}): Promise<T> {
  const announced = (await postJson(announceUrl, { ...announceBody, fileName: file.name, contentType: file.type, sizeBytes: file.size })) as { upload: TUploadTarget };
  await put(announced.upload, file, onProgress, signal);
  onProgress(1);
  return (await postJson(completeUrl)) as T;
}
