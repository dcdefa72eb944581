import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

/** The data layer's direction (DEVELOPERS.md, "Data layer"), checked with the project's own lint config. */
const eslint = new ESLint();

async function restricted(filePath: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath });
  return result!.messages
    .filter((message) => message.ruleId === 'no-restricted-imports')
    .map((message) => message.message);
}

describe('data layer boundaries', () => {
  it('refuses models, Sequelize and repositories in a route', async () => {
    const messages = await restricted(
      'server/routes/probe.ts',
      [
        "import { Print } from '../models';",
        "import { User } from '../models/User';",
        "import { Op } from 'sequelize';",
        "import { findAuditEvents } from '../repositories/audit-repository';",
        'export const used = [Print, User, Op, findAuditEvents];',
      ].join('\n'),
    );
    expect(messages).toHaveLength(4);
    expect(messages[0]).toMatch(/Routes do not touch models/);
    expect(messages[3]).toMatch(/services call repositories/);
  });

  it('lets a route call services and presenters', async () => {
    const messages = await restricted(
      'server/routes/probe.ts',
      [
        "import { presentSettings } from '../presenters/settings';",
        "import { loadSettings } from '../services/settings/settings-store';",
        'export const used = [presentSettings, loadSettings];',
      ].join('\n'),
    );
    expect(messages).toEqual([]);
  });

  it('refuses a presenter in a service, but not in a route or another presenter', async () => {
    const code =
      "import { presentPaper } from '../presenters/reference';\nexport const p = presentPaper;\n";
    expect(await restricted('server/services/probe.ts', code)).toHaveLength(1);
    expect(await restricted('server/repositories/probe.ts', code)).toHaveLength(1);
    expect(await restricted('server/presenters/probe.ts', code)).toEqual([]);
  });
});
