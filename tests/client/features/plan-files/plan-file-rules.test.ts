import { describe, expect, it } from 'vitest';
import { MAX_UPLOAD_BYTES } from '../../../../shared/api/pricing';
import {
  TOO_LARGE_MESSAGE,
  UNSUPPORTED_TYPE_MESSAGE,
  formatFileSize,
  precheckPlanFile,
  progressPercent,
} from '../../../../src/features/plan-files/plan-file-rules';

describe('plan file pre-check (the same refusals as POST /api/jobs/:id/files)', () => {
  it('uses the server messages word for word', () => {
    expect(UNSUPPORTED_TYPE_MESSAGE).toBe('Upload a PDF, PNG or JPEG plan');
    expect(TOO_LARGE_MESSAGE).toBe(
      'The plan is larger than 25 MB. Upload a file of at most 25 MB.',
    );
  });

  it('accepts PDF, PNG and JPEG by extension or by MIME type', () => {
    expect(precheckPlanFile({ name: 'Site Plan.PDF', type: '', size: 10 })).toBeNull();
    expect(precheckPlanFile({ name: 'roof.jpeg', type: '', size: 10 })).toBeNull();
    expect(precheckPlanFile({ name: 'scan', type: 'image/png', size: 10 })).toBeNull();
  });

  it('refuses other types', () => {
    expect(precheckPlanFile({ name: 'notes.txt', type: 'text/plain', size: 10 })).toBe(
      UNSUPPORTED_TYPE_MESSAGE,
    );
    expect(precheckPlanFile({ name: 'plan.dwg', type: '', size: 10 })).toBe(
      UNSUPPORTED_TYPE_MESSAGE,
    );
  });

  it('takes exactly 25 MB (25 × 1024 × 1024 bytes) and refuses one byte more', () => {
    expect(MAX_UPLOAD_BYTES).toBe(26_214_400);
    expect(precheckPlanFile({ name: 'a.pdf', type: '', size: MAX_UPLOAD_BYTES })).toBeNull();
    expect(precheckPlanFile({ name: 'a.pdf', type: '', size: MAX_UPLOAD_BYTES + 1 })).toBe(
      TOO_LARGE_MESSAGE,
    );
  });
});

describe('sizes and progress (common practice: KB and MB of 1024 bytes)', () => {
  it('formats sizes', () => {
    expect(formatFileSize(812)).toBe('812 B');
    expect(formatFileSize(1536)).toBe('1.5 KB');
    expect(formatFileSize(812_000)).toBe('793 KB');
    expect(formatFileSize(MAX_UPLOAD_BYTES)).toBe('25.0 MB');
  });

  it('gives whole percent, clamped, and 0 while the total is unknown', () => {
    expect(progressPercent(0, 100)).toBe(0);
    expect(progressPercent(333, 1000)).toBe(33);
    expect(progressPercent(999, 1000)).toBe(99); // 100 % only once every byte is out
    expect(progressPercent(1000, 1000)).toBe(100);
    expect(progressPercent(5, 0)).toBe(0);
    expect(progressPercent(2000, 1000)).toBe(100);
  });
});
