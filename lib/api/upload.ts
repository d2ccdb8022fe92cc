/**
 * The one request apiFetch cannot make: a multipart upload that reports its progress.
 * fetch has no upload progress events in browsers, XMLHttpRequest has (xhr.upload.onprogress),
 * https://developer.mozilla.org/docs/Web/API/XMLHttpRequest/upload. Same base URL, bearer
 * token and ApiError as apiFetch.
 */
import { ApiError, BASE_URL, errorFromAnswer, requestHeaders } from './client';

/** A picked file: on web the browser's File, on native a file URI the runtime reads. */
export type UploadFile = { name: string; mimeType: string; file?: Blob; uri: string };

export type UploadProgress = (fraction: number) => void;

function formWith(field: string, f: UploadFile): FormData {
  const form = new FormData();
  if (f.file) form.append(field, f.file, f.name);
  // React Native's FormData takes { uri, name, type } for a file part.
  else form.append(field, { uri: f.uri, name: f.name, type: f.mimeType } as unknown as Blob);
  return form;
}

/** POSTs one file as multipart/form-data in `field`; resolves with the JSON answer. */
export function uploadFile<T>(path: string, field: string, file: UploadFile, onProgress?: UploadProgress): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `${BASE_URL}${path}`);
    xhr.withCredentials = true;
    const headers = requestHeaders();
    for (const [k, v] of Object.entries(headers)) xhr.setRequestHeader(k, v);
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress?.(e.loaded / e.total);
    };
    xhr.onload = () => {
      if (xhr.status < 200 || xhr.status >= 300)
        return reject(
          errorFromAnswer(
            xhr.status,
            xhr.responseText,
            'Authorization' in headers,
            xhr.getResponseHeader('Retry-After'),
          ),
        );
      try {
        resolve(JSON.parse(xhr.responseText) as T);
      } catch {
        reject(new ApiError(xhr.status, 'bad_response', 'The server sent an answer that could not be read.'));
      }
    };
    // Same class apiFetch's network failures have, so describeError says "no connection".
    xhr.onerror = () => reject(new TypeError('Network request failed'));
    xhr.send(formWith(field, file));
  });
}
