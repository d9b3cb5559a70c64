import { z } from 'zod';

/**
 * Body of `POST /api/orders/:id/quotes/:number/send`: the builder's people who get the quote,
 * by e-mail address (each a contact of the builder company with an address, or the company's own
 * address). Without `recipients` the quote goes to the company's address.
 */
export const sendQuoteSchema = z.object({
  recipients: z
    .array(z.string().trim().toLowerCase().email('Enter a valid e-mail address'), {
      error: 'Choose who gets the quote',
    })
    .min(1, 'Choose at least one person to send the quote to')
    .max(20, 'Send to at most 20 people at once')
    .optional(),
});
export type SendQuoteInput = z.infer<typeof sendQuoteSchema>;

/** One person a quote can go to: a contact with an address, or the company itself. */
export interface QuoteRecipient {
  email: string;
  /** The contact's name, or the company's when it is the company's address. */
  name: string;
  /** True for the company's own address (greeted by the company name). */
  company: boolean;
}

/**
 * Everyone a builder company's quote can go to: each contact with an e-mail address, then the
 * company's own address unless a contact already uses it. Addresses compare without case.
 */
export function quoteRecipients(builder: {
  name: string;
  email: string;
  contacts: { name: string; email?: string | null }[];
}): QuoteRecipient[] {
  const seen = new Set<string>();
  const out: QuoteRecipient[] = [];
  for (const c of builder.contacts) {
    const email = c.email?.trim().toLowerCase();
    if (!email || seen.has(email)) continue;
    seen.add(email);
    out.push({ email, name: c.name, company: false });
  }
  const own = builder.email.trim().toLowerCase();
  if (!seen.has(own)) out.push({ email: own, name: builder.name, company: true });
  return out;
}

/**
 * How a message greets its reader: a person by their first name ("Ana" of "Ana Castillo"), a
 * company by its name.
 */
export function greetingName(r: Pick<QuoteRecipient, 'name' | 'company'>): string {
  if (r.company) return r.name;
  const first = r.name.trim().split(/\s+/)[0];
  return first && first.length > 1 && !first.endsWith('.') ? first : r.name.trim();
}
