import { createHash } from 'node:crypto';
import { existsSync, readFileSync } from 'node:fs';
import { join, normalize, sep } from 'node:path';

const STYLESHEET = /<link rel="stylesheet"[^>]*? href="(\/assets\/[^"]+\.css)"[^>]*>/g;

/**
 * The built stylesheet written into the index page as a `<style>` element, with the CSP
 * hash that lets it apply. A linked stylesheet blocks the first paint until it arrives, and
 * shares the line with the main script and the preloads: "Opening Printwarden…" waited for
 * all of them (Lighthouse's first paint came after the main script had run). The app's one
 * stylesheet is about 9 kB gzipped, and the index page is sent gzipped.
 */
export function inlineStylesheets(
  html: string,
  clientDir: string,
): { html: string; styleHashes: string[] } {
  const assets = join(clientDir, 'assets');
  const styleHashes: string[] = [];
  const inlined = html.replace(STYLESHEET, (link, href: string) => {
    const file = normalize(join(clientDir, href));
    if (!file.startsWith(assets + sep) || !existsSync(file)) return link;
    const css = readFileSync(file, 'utf8');
    // A style element ends at the first `</style`: such a sheet stays a link.
    if (/<\/style/i.test(css)) return link;
    styleHashes.push(`'sha256-${createHash('sha256').update(css).digest('base64')}'`);
    return `<style>${css}</style>`;
  });
  return { html: inlined, styleHashes };
}

/**
 * The policy with the inlined sheets' hashes added to `style-src`. Browsers that know hashes
 * then ignore its `'unsafe-inline'` (kept only for those that do not), so no other inline
 * style element applies.
 */
export function withStyleHashes(policy: string, styleHashes: string[]): string {
  if (styleHashes.length === 0) return policy;
  const directives = policy.split(';').map((directive) => directive.trim());
  const index = directives.findIndex((directive) => /^style-src(\s|$)/.test(directive));
  if (index === -1) directives.push(`style-src 'self' ${styleHashes.join(' ')}`);
  else directives[index] = `${directives[index]} ${styleHashes.join(' ')}`;
  return directives.filter(Boolean).join(';');
}
