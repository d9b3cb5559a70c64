import { describe, expect, it } from 'vitest';
import { createApiError } from '../../../src/lib/api-client';
import { serverFieldErrors } from '../../../src/lib/form-errors';

const names = ['name', 'email', 'contacts', 'criteria'];

describe('server field errors beside form inputs', () => {
  it('keeps messages whose top-level field is in the form, nested paths included', () => {
    const error = createApiError(400, 'invalid', 'Check the highlighted fields.', {
      email: 'A builder with this e-mail exists',
      'contacts.1.email': 'Enter a valid e-mail address',
      'criteria.loads.tcll': 'TCLL cannot be negative',
      plantId: 'Unknown plant',
    });
    expect(serverFieldErrors(error, names)).toEqual([
      ['email', 'A builder with this e-mail exists'],
      ['contacts.1.email', 'Enter a valid e-mail address'],
      ['criteria.loads.tcll', 'TCLL cannot be negative'],
    ]);
  });

  it('returns nothing for errors that are not API errors or have no fields', () => {
    expect(serverFieldErrors(new Error('boom'), names)).toEqual([]);
    expect(serverFieldErrors(null, names)).toEqual([]);
    expect(serverFieldErrors(createApiError(500, 'server', 'Down'), names)).toEqual([]);
  });
});
