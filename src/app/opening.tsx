/**
 * What shows while the first page's code loads: the same words, in the same place, as the
 * paragraph index.html paints before any script runs, so the screen does not jump.
 */
export function Opening() {
  return (
    <p role="status" className="py-8 text-center text-sm text-ink-faint">
      Opening Printwarden…
    </p>
  );
}
