/** 'missing' (no build), 'stale' (a source changed since) or 'fresh'; paths from `root`. */
export function buildState(root?: string): 'missing' | 'stale' | 'fresh';
