import { ApiError } from './client';

/**
 * Sends one file as multipart form data. XMLHttpRequest rather than fetch because only it reports upload progress,
 * which a 40 MB logger file on a farm connection needs.
 */
export function uploadFile<T>(path: string, file: File, fields: Record<string, string>, onProgress?: (fraction: number) => void): Promise<T> {
  return new Promise((resolve, reject) => {
    const form = new FormData();
    for (const [key, value] of Object.entries(fields)) form.append(key, value);
    form.append('file', file, file.name);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.responseType = 'json';
    xhr.setRequestHeader('accept', 'application/json');
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress?.(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', 'Could not reach the Coldknit server. Check the connection and try again.'));
    xhr.onload = () => {
      const body = xhr.response as { error?: { code: string; message: string } } | null;
      if (xhr.status >= 200 && xhr.status < 300) resolve(body as T);
      else reject(new ApiError(xhr.status, body?.error?.code ?? 'http_error', body?.error?.message ?? `The server answered ${xhr.status}.`));
    };
    xhr.send(form);
  });
}
