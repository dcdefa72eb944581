import { parseArgs } from 'node:util';
import { passwordSchema } from '../../shared/schemas/people';
import { removeDemoAccounts } from '../auth/demo-accounts';
import { databaseUrlFrom } from '../config';
import { migrateUp } from '../db/migrate';
import { openDatabase } from '../db/sequelize';
import { initModels } from '../models';
import { createFirstAdmin } from '../services/people/first-admin';
import { Prompt } from './prompt';

const USAGE = `Makes the first admin of a Printwarden database.

  npm run create-admin                      asks for e-mail, name and password
  npm run create-admin -- --email E --name N   takes the password from standard input
  npm run create-admin -- --force           adds an admin even though one exists
  npm run create-admin -- --remove-demo     removes the demo accounts of a database once seeded as a demo
`;

const { values } = parseArgs({
  options: {
    email: { type: 'string' },
    name: { type: 'string' },
    force: { type: 'boolean', default: false },
    'remove-demo': { type: 'boolean', default: false },
    help: { type: 'boolean', default: false },
  },
});
if (values.help) {
  console.log(USAGE);
  process.exit(0);
}

const sequelize = await openDatabase(databaseUrlFrom(process.env));
initModels(sequelize);
await migrateUp(sequelize);
process.exitCode = await main();
await sequelize.close();

async function main(): Promise<number> {
  if (values['remove-demo']) {
    const { deleted, retired } = await removeDemoAccounts(sequelize);
    if (deleted + retired === 0) console.log('This database holds no demo accounts.');
    else
      console.log(
        `Demo accounts removed: ${deleted} deleted, ${retired} retired (kept as names only, because records name them; they cannot sign in).`,
      );
    return 0;
  }
  const prompt = new Prompt();
  try {
    const input = values.email ? await fromArguments(prompt) : await fromQuestions(prompt);
    if (!input) return 2;
    const cost = process.env.PASSWORD_COST ? Number(process.env.PASSWORD_COST) : undefined;
    const result = await createFirstAdmin(sequelize, input, {
      force: values.force,
      passwordCost: cost,
    });
    if (result.outcome === 'invalid') {
      for (const error of result.errors) console.error(error);
      return 2;
    }
    if (result.outcome === 'refused') {
      console.error(result.reason);
      return 1;
    }
    const { email } = result.user;
    console.log(
      result.outcome === 'created'
        ? `Admin ${email} created. Sign in, then invite everyone else from People.`
        : `${email} is now an active admin with the new password.`,
    );
    return 0;
  } finally {
    prompt.close();
  }
}

/** `--email E --name N`, the password alone on the first line of standard input. */
async function fromArguments(prompt: Prompt) {
  if (!values.name) {
    console.error('Give --name with --email (and the password on standard input).');
    return null;
  }
  const password = await prompt.nextLine();
  if (password === null) {
    console.error('No password on standard input.');
    return null;
  }
  return { email: values.email!, name: values.name, password };
}

/** Asks for each value; the password twice, without echo. */
async function fromQuestions(prompt: Prompt) {
  const email = await prompt.ask('E-mail address: ');
  const name = await prompt.ask('Name: ');
  for (let attempt = 0; attempt < 3; attempt += 1) {
    const password = await prompt.ask('Password (at least 12 characters): ', { hidden: true });
    const again = await prompt.ask('The same password again: ', { hidden: true });
    if (email === null || name === null || password === null || again === null) break;
    const problem = passwordSchema.safeParse(password).error?.issues[0]?.message;
    if (problem) console.error(`That password will not do: ${problem.toLowerCase()}; try again.`);
    else if (password !== again) console.error('The two passwords differ; try again.');
    else return { email, name, password };
  }
  console.error('No admin made.');
  return null;
}
