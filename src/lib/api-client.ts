import * as z from 'zod/mini';

/** An error reply from the API, in the one shape the server uses: `{ error: { code, message, fields? } }`. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string[]>,
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
  }
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

interface RequestOptions<S extends z.core.$ZodType | undefined> {
  method?: Method;
  body?: unknown;
  /** Parses the reply; a reply that does not match is a bug on one side and surfaces as an error. */
  schema?: S;
  signal?: AbortSignal;
}

type Reply<S> = S extends z.core.$ZodType ? z.output<S> : unknown;

/** The one way the client talks to the server: cookies included, JSON or FormData, typed errors. */
export async function api<S extends z.core.$ZodType | undefined = undefined>(
  path: string,
  { method = 'GET', body, schema, signal }: RequestOptions<S> = {},
): Promise<Reply<S>> {
  const isForm = body instanceof FormData;
  const res = await fetch(`/api${path}`, {
    method,
    credentials: 'same-origin',
    headers:
      body === undefined || isForm
        ? { Accept: 'application/json' }
        : { 'Content-Type': 'application/json', Accept: 'application/json' },
    body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
    signal,
  });
  if (!res.ok) throw await toApiError(res.status, await res.text(), res.headers.get('Retry-After'));
  if (res.status === 204) return undefined as Reply<S>;
  const data: unknown = await res.json();
  return (schema ? z.parse(schema, data) : data) as Reply<S>;
}

/** Upload with progress (fetch has no upload progress): XMLHttpRequest, same error shape as `api`. */
export function uploadWithProgress<S extends z.core.$ZodType>(
  path: string,
  form: FormData,
  schema: S,
  onProgress: (fraction: number) => void,
  signal?: AbortSignal,
): Promise<z.output<S>> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.responseType = 'text';
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = async () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          resolve(z.parse(schema, JSON.parse(xhr.responseText)));
        } catch (err) {
          reject(err);
        }
      } else reject(await toApiError(xhr.status, xhr.responseText, xhr.getResponseHeader('Retry-After')));
    };
    xhr.onerror = () =>
      reject(new ApiError(0, 'NETWORK', 'The upload could not reach the server. Check the connection and try again.'));
    signal?.addEventListener('abort', () => xhr.abort());
    xhr.send(form);
  });
}

async function toApiError(status: number, text: string, retryAfter: string | null): Promise<ApiError> {
  let body: { error?: { code?: string; message?: string; fields?: Record<string, string[]> } } = {};
  try {
    body = JSON.parse(text);
  } catch {
    // Not JSON: a proxy or a crash page. Fall through to a generic message.
  }
  const e = body.error ?? {};
  return new ApiError(
    status,
    e.code ?? 'HTTP_' + status,
    e.message ?? (status === 0 ? 'The server could not be reached.' : `The server answered ${status}.`),
    e.fields,
    retryAfter ? Number(retryAfter) : undefined,
  );
}
