import {
  MAX_UPLOAD_BYTES,
  PLAN_TOO_LARGE_MESSAGE as TOO_LARGE_MESSAGE,
  UNSUPPORTED_PLAN_TYPE_MESSAGE as UNSUPPORTED_TYPE_MESSAGE,
  type StoredFile,
} from '../../../shared/api/pricing';

// The server's own refusals, shown before any byte is sent too.
export { TOO_LARGE_MESSAGE, UNSUPPORTED_TYPE_MESSAGE };

/** What the file picker offers: the three plan types by extension and by MIME type. */
export const PLAN_FILE_ACCEPT = '.pdf,.png,.jpg,.jpeg,application/pdf,image/png,image/jpeg';

const EXTENSIONS = new Set(['pdf', 'png', 'jpg', 'jpeg']);
const MIME_TYPES = new Set(['application/pdf', 'image/png', 'image/jpeg']);

/** The few fields of a browser `File` the pre-check reads. */
export interface FileFacts {
  name: string;
  type: string;
  size: number;
}

/**
 * The same refusals as the server, before any byte is sent. Only a courtesy: the server still
 * sniffs the real type from the content, so a wrongly named file is caught there.
 */
export function precheckPlanFile(file: FileFacts): string | null {
  const ext = file.name.includes('.') ? file.name.split('.').pop()!.toLowerCase() : '';
  if (!EXTENSIONS.has(ext) && !MIME_TYPES.has(file.type.toLowerCase()))
    return UNSUPPORTED_TYPE_MESSAGE;
  if (file.size > MAX_UPLOAD_BYTES) return TOO_LARGE_MESSAGE;
  return null;
}

const TYPE_LABELS: Record<StoredFile['contentType'], string> = {
  'application/pdf': 'PDF',
  'image/png': 'PNG',
  'image/jpeg': 'JPEG',
};

/** Short name of a stored plan's type ("PDF"). */
export function planTypeLabel(contentType: StoredFile['contentType']): string {
  return TYPE_LABELS[contentType] ?? contentType;
}

/**
 * A size people read: bytes, then KB and MB of 1024 (common practice, and how the 25 MB limit
 * itself is counted: 25 × 1024 × 1024 bytes).
 */
export function formatFileSize(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  const [value, unit] = bytes < 1024 * 1024 ? [bytes / 1024, 'KB'] : [bytes / (1024 * 1024), 'MB'];
  // One decimal while it still tells something ("2.4 MB"), none once it is noise ("793 KB").
  return `${value.toFixed(value < 100 ? 1 : 0)} ${unit}`;
}

/** Whole percent sent, 0–100; an unknown total counts as nothing sent yet. */
export function progressPercent(loaded: number, total: number): number {
  if (!(total > 0)) return 0;
  return Math.min(100, Math.max(0, Math.floor((loaded / total) * 100)));
}
