/** Only same-site paths are followed after sign-in (no open redirect). */
export function safeReturnPath(from: string | null): string {
  return from && from.startsWith('/') && !from.startsWith('//') && !from.startsWith('/sign-in')
    ? from
    : '/';
}
