import clsx from 'clsx';
import { useId, useRef, useState, type DragEvent } from 'react';
import { Alert, Button, ErrorMessage } from '../../../components/ui';
import { useUploadPlanFile } from '../api/upload-plan-file';
import {
  PLAN_FILE_ACCEPT,
  formatFileSize,
  precheckPlanFile,
  progressPercent,
} from '../plan-file-rules';
import { UploadProgress } from './UploadProgress';

/** Props of {@link UploadArea}. */
export interface UploadAreaProps {
  jobId: number;
}

const isAbort = (e: unknown) => e instanceof DOMException && e.name === 'AbortError';

/** Choose or drop one plan, check it here as the server would, then send it with progress. */
export function UploadArea({ jobId }: UploadAreaProps) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const abort = useRef<AbortController | null>(null);
  const [file, setFile] = useState<File | null>(null);
  const [problem, setProblem] = useState<string | null>(null);
  const [percent, setPercent] = useState(0);
  const [dragging, setDragging] = useState(false);
  const [uploaded, setUploaded] = useState<string | null>(null);
  const upload = useUploadPlanFile(jobId);

  const choose = (next: File | null) => {
    upload.reset();
    setUploaded(null);
    setFile(next);
    setProblem(next ? precheckPlanFile(next) : null);
  };

  const start = () => {
    if (!file || problem) return;
    const controller = new AbortController();
    abort.current = controller;
    setPercent(0);
    upload.mutate(
      {
        file,
        signal: controller.signal,
        onProgress: (loaded, total) => setPercent(progressPercent(loaded, total)),
      },
      {
        onSuccess: (stored) => {
          setUploaded(stored.name);
          setFile(null);
          if (input.current) input.current.value = '';
        },
      },
    );
  };

  const onDrop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    if (upload.isPending) return;
    choose(e.dataTransfer.files[0] ?? null);
  };

  const refusal = upload.error && !isAbort(upload.error) ? upload.error : null;
  return (
    <div className="flex flex-col gap-4">
      <div
        onDragOver={(e) => {
          e.preventDefault();
          if (!upload.isPending) setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={clsx(
          'flex flex-col items-center gap-3 rounded-md border-2 border-dashed px-4 py-6 text-center',
          dragging ? 'border-timber-500 bg-timber-50' : 'border-sand-300 bg-sand-50',
        )}
      >
        <p className="text-base text-sand-800">
          Drop a PDF, PNG or JPEG plan here, or choose one. Up to 25 MB.
        </p>
        <div className="flex flex-col items-center gap-1.5">
          <label htmlFor={inputId} className="text-sm font-medium text-sand-800">
            Plan file
          </label>
          <input
            ref={input}
            id={inputId}
            type="file"
            accept={PLAN_FILE_ACCEPT}
            disabled={upload.isPending}
            aria-describedby={problem ? `${inputId}-problem` : undefined}
            aria-invalid={problem ? true : undefined}
            onChange={(e) => choose(e.target.files?.[0] ?? null)}
            className={clsx(
              'max-w-full text-sm text-sand-700',
              'file:mr-3 file:h-9 file:cursor-pointer file:rounded file:border file:border-sand-300',
              'file:bg-white file:px-3 file:text-sm file:font-medium file:text-sand-900 hover:file:bg-sand-100',
            )}
          />
          {file && !problem ? (
            <p className="text-xs text-sand-600">
              {file.name} · {formatFileSize(file.size)}
            </p>
          ) : null}
        </div>
      </div>

      {problem ? (
        <p id={`${inputId}-problem`} role="alert" className="text-sm text-danger-700">
          {problem}
        </p>
      ) : null}
      {upload.isPending && file ? <UploadProgress percent={percent} fileName={file.name} /> : null}
      {refusal ? <ErrorMessage title="The plan was not uploaded" error={refusal} /> : null}
      {uploaded ? <Alert tone="success">{uploaded} was uploaded.</Alert> : null}

      <div className="flex gap-2">
        <Button onClick={start} disabled={!file || !!problem} busy={upload.isPending}>
          Upload
        </Button>
        {upload.isPending ? (
          <Button variant="secondary" onClick={() => abort.current?.abort()}>
            Cancel
          </Button>
        ) : null}
      </div>
    </div>
  );
}
