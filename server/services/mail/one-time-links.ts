/** What a delivered message keeps where its one-time link was. */
export const LINK_REMOVED = '(one-time link removed once delivered)';

/**
 * A link carrying a one-time token after `#` (32 random bytes, base64url: 43 characters,
 * see people/tokens.ts). In HTML the link sits in an attribute, unchanged by escaping.
 */
const ONE_TIME_LINK = /\bhttps?:\/\/[^\s"'<>]*#[A-Za-z0-9_-]{43}(?![A-Za-z0-9_-])/g;

/** The text with every one-time link taken out (the mail queue keeps delivered mail so). */
export function withoutOneTimeLinks(text: string): string;
export function withoutOneTimeLinks(text: string | null): string | null;
export function withoutOneTimeLinks(text: string | null): string | null {
  return text === null ? null : text.replace(ONE_TIME_LINK, LINK_REMOVED);
}
