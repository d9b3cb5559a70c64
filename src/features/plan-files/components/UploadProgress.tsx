/** Props of {@link UploadProgress}. */
export interface UploadProgressProps {
  /** Whole percent sent, 0–100. */
  percent: number;
  fileName: string;
}

/**
 * The upload's progress bar: a native-looking `role="progressbar"` with its value for assistive
 * tech and the percentage as text for everyone. At 100 % the server is still checking the file.
 */
export function UploadProgress({ percent, fileName }: UploadProgressProps) {
  const done = percent >= 100;
  return (
    <div className="flex flex-col gap-1.5">
      <div className="flex items-baseline justify-between gap-3 text-sm text-sand-700">
        <span className="truncate">
          {done ? 'Checking' : 'Uploading'} <span className="font-medium">{fileName}</span>
          {done ? '…' : ''}
        </span>
        <span className="font-medium text-sand-900 tabular-nums" aria-hidden="true">
          {percent}%
        </span>
      </div>
      <div
        role="progressbar"
        aria-label={`Uploading ${fileName}`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        aria-valuetext={`${percent}%`}
        className="h-2.5 w-full overflow-hidden rounded-full bg-sand-200"
      >
        <div
          className="h-full rounded-full bg-timber-600 transition-[width] duration-150"
          style={{ width: `${percent}%` }}
        />
      </div>
    </div>
  );
}
