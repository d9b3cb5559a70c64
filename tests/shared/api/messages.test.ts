import { describe, expect, it } from 'vitest';
import { createCustomerSchema } from '../../../shared/api/customers';
import { createJobSchema } from '../../../shared/api/jobs';
import { reviewSchema } from '../../../shared/api/orders';

const firstMessage = (r: { success: boolean; error?: { issues: { message: string }[] } }) =>
  r.error?.issues[0]?.message;

describe('refusals speak our words, not the validator’s', () => {
  it('too-long text says how long it may be', () => {
    const long = 'x'.repeat(161);
    expect(firstMessage(createJobSchema.safeParse({ name: long, address: 'A' }))).toBe(
      'Use at most 160 characters',
    );
    expect(
      firstMessage(
        createCustomerSchema.safeParse({
          name: long,
          email: 'a@b.test',
          terms: 'account',
        }),
      ),
    ).toBe('Use at most 160 characters');
    expect(
      firstMessage(reviewSchema.safeParse({ decision: 'return', comment: 'x'.repeat(2001) })),
    ).toBe('Use at most 2000 characters');
  });
});
