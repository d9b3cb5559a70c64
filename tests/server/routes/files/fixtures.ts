import { deflateSync } from 'node:zlib';
import { mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { afterAll } from 'vitest';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Response } from 'superagent';
import type { signedIn } from '../../../support/session';

/** Each test file keeps its uploads in a folder of its own (read by server/services/storage.ts). */
export function useTempUploadDir() {
  const dir = mkdtempSync(join(tmpdir(), 'spanwise-uploads-'));
  process.env.UPLOAD_DIR = dir;
  afterAll(() => rmSync(dir, { recursive: true, force: true }));
  return dir;
}

/** Every file under the upload folder, temp folder included: "nothing stored" means none new. */
export function filesOnDisk(dir: string): string[] {
  return readdirSync(dir, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => join(e.parentPath, e.name));
}

function crc32(buf: Buffer) {
  let c = ~0;
  for (const byte of buf) {
    c ^= byte;
    for (let k = 0; k < 8; k++) c = (c >>> 1) ^ (0xedb88320 & -(c & 1));
  }
  return ~c >>> 0;
}

function chunk(type: string, data: Buffer) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

/**
 * A valid 1×1 grey PNG: the 8-byte signature, IHDR, IDAT and IEND (W3C PNG Specification,
 * Second Edition, §5.2 signature and §11.2 critical chunks; CRC-32 as in its Annex D).
 */
export function pngBytes(): Buffer {
  const ihdr = Buffer.from([0, 0, 0, 1, 0, 0, 0, 1, 8, 0, 0, 0, 0]); // 1×1, 8-bit greyscale
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.from([0, 0x80]))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** A one-page PDF: the "%PDF-1.4" header and "%%EOF" trailer (ISO 32000-1:2008 §7.5.2, §7.5.5). */
export function pdfBytes(): Buffer {
  return Buffer.from(
    '%PDF-1.4\n1 0 obj << /Type /Catalog /Pages 2 0 R >> endobj\n' +
      '2 0 obj << /Type /Pages /Kids [3 0 R] /Count 1 >> endobj\n' +
      '3 0 obj << /Type /Page /Parent 2 0 R /MediaBox [0 0 612 792] >> endobj\n' +
      'trailer << /Root 1 0 R >>\n%%EOF\n',
    'latin1',
  );
}

/** JPEG/JFIF start: SOI FF D8 then an APP0 "JFIF" marker (ITU-T T.81 Annex B; JFIF 1.02). */
export function jpegBytes(): Buffer {
  return Buffer.concat([
    Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10]),
    Buffer.from('JFIF\0', 'latin1'),
    Buffer.from([1, 2, 0, 0, 1, 0, 1, 0, 0, 0xff, 0xd9]),
  ]);
}

type Session = Awaited<ReturnType<typeof signedIn>>;

/** Upload `bytes` as `name` to a job through the API, as the session's user. */
export function upload(s: Session, jobId: number, bytes: Buffer, name: string, type?: string) {
  return s.agent
    .post(`/api/jobs/${jobId}/files`)
    .set('X-CSRF-Token', s.token)
    .attach('file', bytes, { filename: name, contentType: type ?? 'application/octet-stream' });
}

/** Collect a binary response body as a Buffer (supertest leaves unknown types unparsed). */
export function binary(res: Response, cb: (err: Error | null, body: Buffer) => void) {
  // In Node, superagent hands the parser the raw response stream.
  const stream = res as unknown as NodeJS.ReadableStream;
  const parts: Buffer[] = [];
  stream.on('data', (c: Buffer) => parts.push(c));
  stream.on('end', () => cb(null, Buffer.concat(parts)));
  stream.on('error', (e: Error) => cb(e, Buffer.alloc(0)));
}
