import { describe, expect, it } from 'vitest';
import { expectAccessible, openArea, signInWith, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

const signIn = (email: string, password: string) =>
  signInWith(live.browser, live.server.url, email, password);

/** As admin, the href of the newest outbox message with this subject. */
async function linkFromOutbox(subject: string, scan = false): Promise<string> {
  const page = await signIn('admin@printwarden.test', 'printwarden-demo');
  await openArea(page, 'Outbox');
  const message = page.getByRole('button', { name: new RegExp(subject) }).first();
  await message.waitFor({ timeout: 15_000 });
  await message.click();
  if (scan) await expectAccessible(page, 'outbox');
  const href = await page.getByRole('link', { name: /^http/ }).first().getAttribute('href');
  await page.close();
  return href!;
}

const NEW_PASSWORD = 'rowan keeps the salt prints';
const RESET_PASSWORD = 'rowan changed it after all';

describe('people and e-mail', () => {
  it('an admin invites a conservator; the link from the outbox opens a conservator account', async () => {
    const admin = await signIn('admin@printwarden.test', 'printwarden-demo');
    await openArea(admin, 'People');
    await admin.getByRole('heading', { name: 'People', level: 1 }).waitFor();
    const form = admin.getByRole('form', { name: 'Invite a colleague' });
    await form.getByLabel('E-mail').fill('rowan@example.org');
    await form.getByLabel('Role').selectOption('conservator');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await admin.getByText('Invitation sent to rowan@example.org').waitFor();
    await admin.getByRole('cell', { name: 'rowan@example.org' }).first().waitFor();
    await expectAccessible(admin, 'people');
    await admin.close();

    const link = await linkFromOutbox('Your invitation to Printwarden', true);
    expect(link).toMatch(new RegExp(`^${live.server.url}/accept-invitation#[\\w-]{43}$`));

    const page = await live.browser.freshPage();
    await page.goto(link);
    await page.getByText('You are invited as conservator').waitFor();
    await page.getByLabel('Your name').fill('Rowan Ellery');
    await page.getByLabel('Password', { exact: true }).fill(NEW_PASSWORD);
    await page.getByLabel('Password again').fill('not the same password');
    await page.getByRole('button', { name: 'Create my account' }).click();
    await page.getByText('The two passwords differ').waitFor();
    await expectAccessible(page, 'accept-invitation');
    await page.getByLabel('Password again').fill(NEW_PASSWORD);
    await page.getByRole('button', { name: 'Create my account' }).click();
    await page.getByRole('heading', { name: 'Today', level: 1 }).waitFor();
    await page.getByRole('link', { name: /conservator/ }).waitFor();
    await page.close();

    // Signing in afresh with the new account gives the conservator's role.
    const again = await signIn('rowan@example.org', NEW_PASSWORD);
    await again.getByRole('link', { name: /conservator/ }).click();
    await again.getByRole('heading', { name: 'Your password' }).waitFor();
    await expectAccessible(again, 'account');
    await again.close();
  });

  it('a reset link changes the password once and cannot be used twice', async () => {
    const page = await live.browser.freshPage();
    await page.goto(`${live.server.url}/sign-in`);
    await page.getByRole('link', { name: 'Forgotten your password?' }).click();
    // The page loads on demand: until it is drawn, the sign-in form (with its own E-mail
    // field) is still on screen, and filling that one lost the address under load.
    await page.getByRole('heading', { name: 'Forgotten password', level: 1 }).waitFor();
    await page.getByLabel('E-mail').fill('rowan@example.org');
    await page.getByRole('button', { name: 'Send the link' }).click();
    await page.getByText('If this address has an account').waitFor();
    await expectAccessible(page, 'forgot-password');
    await page.close();

    const link = await linkFromOutbox('Reset your Printwarden password');
    const reset = await live.browser.freshPage();
    await reset.goto(link);
    await reset.getByLabel('New password', { exact: true }).fill(RESET_PASSWORD);
    await reset.getByLabel('New password again').fill(RESET_PASSWORD);
    await reset.getByRole('button', { name: 'Set the new password' }).click();
    await reset.getByRole('heading', { name: 'Password changed' }).waitFor();
    await expectAccessible(reset, 'password-changed');

    await reset.goto(`${live.server.url}/sign-in`);
    await reset.goto(link);
    await reset.getByLabel('New password', { exact: true }).fill('a third password here');
    await reset.getByLabel('New password again').fill('a third password here');
    await reset.getByRole('button', { name: 'Set the new password' }).click();
    await reset.getByText(/not valid any more/).waitFor();
    await reset.close();

    const signedIn = await signIn('rowan@example.org', RESET_PASSWORD);
    await signedIn.close();
  });
});
