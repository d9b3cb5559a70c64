/**
 * Plan files on disk: one folder outside the web root (UPLOAD_DIR, default `.data/uploads`), random
 * stored names, and a `tmp/` folder inside it for uploads that are not yet checked.
 */
import { randomUUID } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { readdir, rename, rm, stat } from 'node:fs/promises';
import { join, resolve } from 'node:path';
import { fileTypeFromFile } from 'file-type';
import type { StoredFile } from '../../shared/api/pricing';

/** The three plan types we accept, by the type sniffed from the bytes. */
export type PlanContentType = StoredFile['contentType'];

/** The extension a stored file gets for each accepted type. */
export const PLAN_EXTENSIONS: Record<PlanContentType, string> = {
  'application/pdf': 'pdf',
  'image/png': 'png',
  'image/jpeg': 'jpg',
};

/** Read on every call so tests (and a changed environment) point at their own folder. */
export function uploadDir(): string {
  return resolve(process.env.UPLOAD_DIR || '.data/uploads');
}

/** Where multer writes an upload before its type is checked; created on demand. */
export function uploadTempDir(): string {
  const dir = join(uploadDir(), 'tmp');
  mkdirSync(dir, { recursive: true });
  return dir;
}

/**
 * Remove uploads a killed process left half-written in the temp folder. Only ones older than
 * `olderThanMs`: another app server sharing UPLOAD_DIR may be receiving a file right now.
 */
export async function sweepPartialUploads(olderThanMs = 60 * 60 * 1000): Promise<string[]> {
  const dir = uploadTempDir();
  const cutoff = Date.now() - olderThanMs;
  const swept: string[] = [];
  for (const name of await readdir(dir)) {
    if (!name.endsWith('.part')) continue;
    const path = join(dir, name);
    const info = await stat(path).catch(() => null);
    if (info && info.mtimeMs < cutoff) {
      await removeQuietly(path);
      swept.push(name);
    }
  }
  return swept;
}

// A stored name is ours alone (uuid + known extension): anything else never reaches the disk API.
const STORED_NAME = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}\.(pdf|png|jpg)$/;

/** Absolute path of a stored file; refuses names that are not of our own making. */
export function storedPath(storedName: string): string {
  if (!STORED_NAME.test(storedName)) throw new Error(`Not a stored file name: ${storedName}`);
  return join(uploadDir(), storedName);
}

/** A fresh random stored name with the safe extension of its type. */
export function newStoredName(type: PlanContentType): string {
  return `${randomUUID()}.${PLAN_EXTENSIONS[type]}`;
}

/** The plan type sniffed from the file's first bytes, or null when it is none of the three. */
export async function sniffPlanType(path: string): Promise<PlanContentType | null> {
  const found = await fileTypeFromFile(path);
  const mime = found?.mime as string | undefined;
  return mime && mime in PLAN_EXTENSIONS ? (mime as PlanContentType) : null;
}

/** Move a checked upload from the temp folder to its stored name (same file system: a rename). */
export async function moveIntoStorage(tempPath: string, storedName: string): Promise<void> {
  mkdirSync(uploadDir(), { recursive: true });
  await rename(tempPath, storedPath(storedName));
}

/** Remove a file if it is there; a missing file is already the wanted outcome. */
export async function removeQuietly(path: string | undefined): Promise<void> {
  if (path) await rm(path, { force: true });
}

/** Size in bytes of a stored file, or null when it has gone from the disk. */
export async function storedSize(storedName: string): Promise<number | null> {
  try {
    return (await stat(storedPath(storedName))).size;
  } catch {
    return null;
  }
}

const MAX_NAME = 200;

/**
 * The name a user gave the file, made safe to keep and to show: no folders, no control or
 * reserved characters, no leading dots, at most 200 characters (the extension kept).
 */
export function sanitiseFileName(raw: string): string {
  const base = raw.normalize('NFC').split(/[/\\]/).pop() ?? '';
  const cleaned = base
    .replace(/[\p{Cc}\p{Cf}\p{Cs}<>:"|?*]/gu, '')
    .replace(/\s+/g, ' ')
    .replace(/^[\s.]+|[\s.]+$/g, '');
  if (!cleaned) return 'plan';
  if (cleaned.length <= MAX_NAME) return cleaned;
  const dot = cleaned.lastIndexOf('.');
  const ext = dot > 0 && cleaned.length - dot <= 10 ? cleaned.slice(dot) : '';
  return cleaned.slice(0, MAX_NAME - ext.length).trimEnd() + ext;
}

/** The name a download is saved under: the user's name, with the real type's extension added if needed. */
export function downloadName(name: string, type: PlanContentType): string {
  const ext = name.split('.').pop()?.toLowerCase();
  const ok =
    type === 'image/jpeg' ? ext === 'jpg' || ext === 'jpeg' : ext === PLAN_EXTENSIONS[type];
  return ok ? name : `${name}.${PLAN_EXTENSIONS[type]}`;
}

/** `Content-Disposition` for a download, UTF-8 safe (RFC 6266 with RFC 8187 encoding). */
export function attachmentHeader(name: string): string {
  const encoded = encodeURIComponent(name).replace(
    /['()*]/g,
    (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
  );
  return `attachment; filename*=UTF-8''${encoded}`;
}
