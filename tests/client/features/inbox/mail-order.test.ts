import { describe, expect, it } from 'vitest';
import type { MailMessage } from '../../../../shared/api/pricing';
import { formatSize, newestFirst } from '../../../../src/features/inbox/mail-order';

const message = (id: string, receivedAt: string): MailMessage => ({
  id,
  receivedAt,
  from: 'quotes@plant.example',
  to: ['builder@example.com'],
  subject: `Quote ${id}`,
  text: '',
  attachments: [],
});

describe('demo inbox order', () => {
  it('puts the newest message first, whatever order the fake keeps', () => {
    const sorted = newestFirst([
      message('a', '2026-03-01T09:00:00Z'),
      message('c', '2026-03-02T08:00:00Z'),
      message('b', '2026-03-01T10:30:00Z'),
    ]);
    expect(sorted.map((m) => m.id)).toEqual(['c', 'b', 'a']);
  });
});

// 1 KB = 1024 bytes here, the binary prefix file managers use (IEC 80000-13 calls it KiB).
describe('attachment sizes', () => {
  it('reads bytes, kilobytes and megabytes', () => {
    expect(formatSize(512)).toBe('512 B');
    expect(formatSize(1024)).toBe('1.0 KB');
    expect(formatSize(18_637)).toBe('18 KB');
    expect(formatSize(5 * 1024 * 1024)).toBe('5.0 MB');
  });
});
