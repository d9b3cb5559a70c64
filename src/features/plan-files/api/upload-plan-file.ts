import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';
import { apiErrorSchema } from '../../../../shared/api/auth';
import { api, createApiError, type ApiError } from '../../../lib/api-client';
import { planFileRowSchema, type PlanFileRow } from './list-plan-files';
import { planFileKeys } from './plan-file-keys';

/** The slice of `XMLHttpRequest` an upload uses (a fake stands in for it in tests). */
export type UploadXhr = Pick<
  XMLHttpRequest,
  'open' | 'setRequestHeader' | 'send' | 'abort' | 'status' | 'responseText'
> & {
  upload: { onprogress: ((e: ProgressEvent) => void) | null };
  onload: (() => void) | null;
  onerror: (() => void) | null;
  onabort: (() => void) | null;
};

/** What an upload needs from outside: a request object and the session's CSRF token. */
export interface UploadDeps {
  createXhr: () => UploadXhr;
  /** `fresh` asks for a new token after the server refused the old one. */
  csrfToken: (fresh: boolean) => Promise<string>;
}

/** Options of one upload. */
export interface UploadOptions {
  /** Bytes sent so far of the whole request body. */
  onProgress?: (loaded: number, total: number) => void;
  signal?: AbortSignal;
}

const tokenSchema = z.object({ token: z.string() });

/**
 * The same token the API client sends: `GET /api/auth/csrf` answers the session's one token, so
 * asking again returns it (or the new one after the session rotated).
 */
let token: Promise<string> | null = null;
function sessionCsrfToken(fresh: boolean): Promise<string> {
  if (fresh || !token) {
    token = api
      .request('/api/auth/csrf', { schema: tokenSchema })
      .then((body) => body.token)
      .catch((error: unknown) => {
        token = null; // a failed fetch must not poison the next upload
        throw error;
      });
  }
  return token;
}

const browserDeps: UploadDeps = {
  createXhr: () => new XMLHttpRequest() as unknown as UploadXhr,
  csrfToken: sessionCsrfToken,
};

function errorFrom(status: number, text: string): ApiError {
  let json: unknown = null;
  try {
    json = JSON.parse(text);
  } catch {
    // A proxy's HTML page: fall through to a generic sentence.
  }
  const parsed = apiErrorSchema.safeParse(json);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return createApiError(status, code, message, fields ?? {});
  }
  return createApiError(
    status,
    `http_${status}`,
    status >= 500
      ? 'The server had a problem. Try again in a moment.'
      : `Upload failed (${status}).`,
  );
}

/** One multipart POST; resolves with the status and body whatever the status. */
function send(
  deps: UploadDeps,
  url: string,
  file: File,
  csrf: string,
  opts: UploadOptions,
): Promise<{ status: number; text: string }> {
  return new Promise((resolve, reject) => {
    if (opts.signal?.aborted) return reject(new DOMException('Upload cancelled', 'AbortError'));
    const xhr = deps.createXhr();
    const onAbort = () => xhr.abort();
    opts.signal?.addEventListener('abort', onAbort, { once: true });
    const settle = () => opts.signal?.removeEventListener('abort', onAbort);
    xhr.open('POST', url);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('X-CSRF-Token', csrf);
    // fetch cannot report upload progress; XMLHttpRequest.upload can.
    xhr.upload.onprogress = (e) => opts.onProgress?.(e.loaded, e.lengthComputable ? e.total : 0);
    xhr.onload = () => {
      settle();
      resolve({ status: xhr.status, text: xhr.responseText });
    };
    xhr.onerror = () => {
      settle();
      reject(createApiError(0, 'network', 'Cannot reach the server. Check your connection.'));
    };
    xhr.onabort = () => {
      settle();
      reject(new DOMException('Upload cancelled', 'AbortError'));
    };
    const body = new FormData();
    body.append('file', file, file.name);
    xhr.send(body);
  });
}

/**
 * `POST /api/jobs/:jobId/files` (multipart field `file`) with upload progress → the stored plan.
 * Like the API client, a refused CSRF token is fetched anew and the upload tried once more.
 */
export async function uploadPlanFile(
  jobId: number,
  file: File,
  opts: UploadOptions = {},
  deps: UploadDeps = browserDeps,
): Promise<PlanFileRow> {
  const url = `/api/jobs/${jobId}/files`;
  let res = await send(deps, url, file, await deps.csrfToken(false), opts);
  let error = res.status >= 400 ? errorFrom(res.status, res.text) : null;
  if (error?.status === 403 && error.code === 'csrf') {
    res = await send(deps, url, file, await deps.csrfToken(true), opts);
    error = res.status >= 400 ? errorFrom(res.status, res.text) : null;
  }
  if (error) throw error;
  const parsed = planFileRowSchema.safeParse(JSON.parse(res.text || 'null'));
  if (!parsed.success)
    throw createApiError(
      res.status,
      'bad_response',
      'The server sent data this page does not understand. Reload to get the latest version.',
    );
  return parsed.data;
}

/** The upload mutation: `onProgress` is fed while bytes go out; the job's list refetches after. */
export function useUploadPlanFile(jobId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ file, ...opts }: { file: File } & UploadOptions) =>
      uploadPlanFile(jobId, file, opts),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: planFileKeys(jobId) }),
  });
}
