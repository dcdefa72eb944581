import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { buildDemoTemplate } from './demo-template';

declare module 'vitest' {
  export interface ProvidedContext {
    /** A demo-seeded SQLite file that `startLiveServer` copies (see demo-template.ts). */
    demoTemplate: string;
  }
}

/** Browser tests: the demo database is seeded once per run, not once per file. */
export default async function setup(project: TestProject): Promise<() => void> {
  const dir = mkdtempSync(join(tmpdir(), 'printwarden-demo-template-'));
  const file = join(dir, 'demo.sqlite');
  await buildDemoTemplate(file);
  project.provide('demoTemplate', file);
  return () => rmSync(dir, { recursive: true, force: true });
}
