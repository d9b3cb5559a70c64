import { describe, expect, it } from 'vitest';
import { isApiError } from '../../../../../src/lib/api-client';
import {
  uploadPlanFile,
  type UploadDeps,
  type UploadXhr,
} from '../../../../../src/features/plan-files/api/upload-plan-file';

const row = {
  id: 7,
  jobId: 3,
  name: 'plan.pdf',
  contentType: 'application/pdf',
  size: 4,
  uploadedBy: 'Sam Sales',
  createdAt: '2026-12-01T10:00:00.000Z',
  canDelete: true,
};

interface Sent {
  method: string;
  url: string;
  headers: Record<string, string>;
  body: FormData;
}

/** A scripted XMLHttpRequest: reports progress in quarters, then answers the next response. */
function fakeXhrs(responses: { status: number; body: unknown }[], size = 400) {
  const sent: Sent[] = [];
  const createXhr = (): UploadXhr => {
    const headers: Record<string, string> = {};
    let method = '';
    let url = '';
    const xhr = {
      status: 0,
      responseText: '',
      upload: { onprogress: null as ((e: ProgressEvent) => void) | null },
      onload: null as (() => void) | null,
      onerror: null as (() => void) | null,
      onabort: null as (() => void) | null,
      open: (m: string, u: string) => {
        method = m;
        url = u;
      },
      setRequestHeader: (k: string, v: string) => void (headers[k] = v),
      abort: () => xhr.onabort?.(),
      send: (body: FormData) => {
        sent.push({ method, url, headers, body });
        const next = responses.shift();
        queueMicrotask(() => {
          if (!next) return xhr.onerror?.();
          for (const q of [1, 2, 3, 4])
            xhr.upload.onprogress?.({
              loaded: (size * q) / 4,
              total: size,
              lengthComputable: true,
            } as ProgressEvent);
          xhr.status = next.status;
          xhr.responseText = typeof next.body === 'string' ? next.body : JSON.stringify(next.body);
          xhr.onload?.();
        });
      },
    };
    return xhr as unknown as UploadXhr;
  };
  return { sent, createXhr };
}

function deps(responses: { status: number; body: unknown }[]) {
  const xhrs = fakeXhrs(responses);
  const tokens: boolean[] = [];
  const d: UploadDeps = {
    createXhr: xhrs.createXhr,
    csrfToken: async (fresh) => {
      tokens.push(fresh);
      return fresh ? 't2' : 't1';
    },
  };
  return { d, sent: xhrs.sent, tokens };
}

const plan = () => new File([new Uint8Array([0x25, 0x50, 0x44, 0x46])], 'plan.pdf');

describe('uploadPlanFile (XMLHttpRequest, so the bar can show upload progress)', () => {
  it('posts the file as multipart field "file" with the CSRF token and reports progress', async () => {
    const { d, sent } = deps([{ status: 201, body: row }]);
    const progress: [number, number][] = [];
    const stored = await uploadPlanFile(
      3,
      plan(),
      { onProgress: (l, t) => progress.push([l, t]) },
      d,
    );
    expect(stored).toEqual(row);
    expect(sent).toHaveLength(1);
    expect(sent[0].method).toBe('POST');
    expect(sent[0].url).toBe('/api/jobs/3/files');
    expect(sent[0].headers['X-CSRF-Token']).toBe('t1');
    expect((sent[0].body.get('file') as File).name).toBe('plan.pdf');
    expect(progress).toEqual([
      [100, 400],
      [200, 400],
      [300, 400],
      [400, 400],
    ]);
  });

  it("shows the server's message on a refusal", async () => {
    const { d } = deps([
      {
        status: 415,
        body: { error: { code: 'unsupported_type', message: 'Upload a PDF, PNG or JPEG plan' } },
      },
    ]);
    const error = await uploadPlanFile(3, plan(), {}, d).catch((e: unknown) => e);
    expect(isApiError(error)).toBe(true);
    expect(error).toMatchObject({
      status: 415,
      code: 'unsupported_type',
      message: 'Upload a PDF, PNG or JPEG plan',
    });
  });

  it('refetches a stale CSRF token and tries once more, as the API client does', async () => {
    const { d, sent, tokens } = deps([
      { status: 403, body: { error: { code: 'csrf', message: 'stale' } } },
      { status: 201, body: row },
    ]);
    await expect(uploadPlanFile(3, plan(), {}, d)).resolves.toEqual(row);
    expect(tokens).toEqual([false, true]);
    expect(sent.map((s) => s.headers['X-CSRF-Token'])).toEqual(['t1', 't2']);
  });

  it('turns a proxy page or a dropped connection into a readable error', async () => {
    const proxy = deps([{ status: 502, body: '<html>Bad gateway</html>' }]);
    await expect(uploadPlanFile(3, plan(), {}, proxy.d)).rejects.toMatchObject({
      status: 502,
      message: 'The server had a problem. Try again in a moment.',
    });
    const down = deps([]);
    await expect(uploadPlanFile(3, plan(), {}, down.d)).rejects.toMatchObject({
      status: 0,
      code: 'network',
    });
  });

  it('cancels through its AbortSignal', async () => {
    const { d, sent } = deps([{ status: 201, body: row }]);
    const controller = new AbortController();
    controller.abort();
    await expect(uploadPlanFile(3, plan(), { signal: controller.signal }, d)).rejects.toMatchObject(
      { name: 'AbortError' },
    );
    expect(sent).toHaveLength(0);
  });
});
