/**
 * An e-mail address as accounts are looked up and limits counted: trimmed and lower-cased
 * (the sign-in and reset schemas do the same), so spaces or capitals make no new address.
 */
export function normaliseEmail(value: unknown): string {
  return typeof value === 'string' ? value.trim().toLowerCase() : '';
}
