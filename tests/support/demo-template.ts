import { seedDemo } from '../../seeds/demo';
import { startTestApp } from './test-app';

/**
 * Seeds the demo collection (without images) once and writes the database to `file`, so
 * each browser test file copies it instead of seeding 66 prints again.
 */
export async function buildDemoTemplate(file: string): Promise<void> {
  const test = await startTestApp({ demo: true }, { users: false });
  try {
    const seeded = await seedDemo(test.ctx, { passwordCost: 4 });
    if (!seeded) throw new Error('demo seed did not run');
    // One self-contained file (no WAL beside it), consistent as of now.
    await test.ctx.sequelize.query('VACUUM INTO :file', { replacements: { file } });
  } finally {
    await test.close();
  }
}
