import { describe, expect, it } from 'vitest';
import {
  attachmentHeader,
  downloadName,
  sanitiseFileName,
  storedPath,
} from '../../../../server/services/storage';

// Pure helpers of the files routes (server/services/storage.ts), kept beside the route tests.
describe('plan file names', () => {
  it('drops folders, control and reserved characters and leading dots', () => {
    expect(sanitiseFileName('../../etc/passwd')).toBe('passwd');
    expect(sanitiseFileName('C:\\plans\\roof.pdf')).toBe('roof.pdf');
    expect(sanitiseFileName('a\u0000b\u0007c <d>:"e"|?*.png')).toBe('abc de.png');
    expect(sanitiseFileName('..hidden.pdf')).toBe('hidden.pdf');
    expect(sanitiseFileName('  \u202Egpj.exe  ')).toBe('gpj.exe');
    expect(sanitiseFileName('...')).toBe('plan');
  });

  it('keeps at most 200 characters and the extension', () => {
    const long = `${'x'.repeat(300)}.pdf`;
    const safe = sanitiseFileName(long);
    expect(safe).toHaveLength(200);
    expect(safe.endsWith('.pdf')).toBe(true);
  });

  it('adds the real type to a download name that claims another', () => {
    expect(downloadName('plan.pdf', 'image/png')).toBe('plan.pdf.png');
    expect(downloadName('photo.JPEG', 'image/jpeg')).toBe('photo.JPEG');
    expect(downloadName('plan.pdf', 'application/pdf')).toBe('plan.pdf');
  });

  it("encodes a download name per RFC 8187 (UTF-8, percent-encoded, ' ( ) * escaped too)", () => {
    expect(attachmentHeader("Bob's (1).pdf")).toBe(
      "attachment; filename*=UTF-8''Bob%27s%20%281%29.pdf",
    );
  });

  it('reaches the disk only through names of its own making', () => {
    expect(() => storedPath('../../secret.pdf')).toThrow();
    expect(() => storedPath('0b7c5a0e-1c2d-4e5f-8a9b-0c1d2e3f4a5b.exe')).toThrow();
    expect(storedPath('0b7c5a0e-1c2d-4e5f-8a9b-0c1d2e3f4a5b.pdf')).toMatch(/\.pdf$/);
  });
});
