import { ApiError } from '@/lib/api-client';

/**
 * Fetches the portfolio ZIP as the server streams it, reporting the bytes received so far (the size is not known
 * until the server has finished), then hands it to the browser as a download.
 */
export async function downloadPortfolio(
  apprenticeId: number,
  onBytes: (received: number) => void,
  signal?: AbortSignal,
) {
  const res = await fetch(`/api/apprentices/${apprenticeId}/portfolio.zip`, { credentials: 'same-origin', signal });
  if (!res.ok || !res.body) {
    const body = (await res.json().catch(() => ({}))) as { error?: { code?: string; message?: string } };
    throw new ApiError(
      res.status,
      body.error?.code ?? `HTTP_${res.status}`,
      body.error?.message ?? 'The portfolio could not be prepared.',
    );
  }
  const reader = res.body.getReader();
  const chunks: Uint8Array<ArrayBuffer>[] = [];
  let received = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    chunks.push(value);
    received += value.byteLength;
    onBytes(received);
  }
  const name = /filename="([^"]+)"/.exec(res.headers.get('Content-Disposition') ?? '')?.[1] ?? 'portfolio.zip';
  const url = URL.createObjectURL(new Blob(chunks, { type: 'application/zip' }));
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
  return received;
}
