import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, expectAccessible, signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

describe('people: questions before acting, and a word after', () => {
  it('asks before deactivating and revoking, says what happened, and asks before re-inviting', async () => {
    const page = await signInAs(live.browser, live.server.url, 'admin', undefined, '/people');
    await page.getByRole('heading', { name: 'People', level: 1 }).waitFor();
    const status = page.getByRole('status');

    // A role change is confirmed in words.
    const curatorRow = page.getByRole('row').filter({ hasText: 'curator@printwarden.test' });
    await curatorRow.getByRole('combobox').selectOption('conservator');
    await status.getByText(/is now a conservator/).waitFor();
    await curatorRow.getByRole('combobox').selectOption('curator');
    await status.getByText(/is now a curator/).waitFor();

    // Deactivation asks first; cancelling changes nothing.
    await curatorRow.getByRole('button', { name: /^Deactivate/ }).click();
    const ask = page.getByRole('dialog', { name: /^Deactivate/ });
    await ask.waitFor();
    await expectAccessible(page);
    await ask.getByRole('button', { name: 'Cancel' }).click();
    await expect.poll(() => curatorRow.getByText('active', { exact: true }).count()).toBe(1);
    await curatorRow.getByRole('button', { name: /^Deactivate/ }).click();
    await ask.getByRole('button', { name: 'Deactivate' }).click();
    await status.getByText(/is deactivated: signed out everywhere/).waitFor();

    // Inviting, then inviting the same address again: asked, then told.
    const form = page.getByRole('form', { name: 'Invite a colleague' });
    await form.getByLabel('E-mail').fill('hazel@example.org');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByText('Invitation sent to hazel@example.org').waitFor();
    const invitationsTable = page.getByRole('table', { name: 'Invitations' });
    await invitationsTable.getByRole('cell', { name: 'hazel@example.org', exact: true }).waitFor();
    await expect
      .poll(() =>
        invitationsTable.getByRole('cell', { name: 'hazel@example.org', exact: true }).count(),
      )
      .toBe(1);
    await form.getByLabel('E-mail').fill('hazel@example.org');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    const again = page.getByRole('dialog', { name: /already has an open invitation/ });
    await again.waitFor();
    await again.getByRole('button', { name: 'Send a new invitation' }).click();
    await page.getByText(/earlier invitation to this address is revoked/).waitFor();

    // Revoking asks, then says so; a revoked link has no "valid until" date.
    const open = invitationsTable.getByRole('row').filter({ hasText: 'hazel@example.org' }).filter({
      hasText: 'open',
    });
    await open.getByRole('button', { name: /^Revoke/ }).click();
    await page
      .getByRole('dialog', { name: /^Revoke the invitation/ })
      .getByRole('button', {
        name: 'Revoke',
      })
      .click();
    // The invite form's own status also says an earlier link is revoked: name this one.
    await status
      .getByText('The invitation to hazel@example.org is revoked: its link no longer works.')
      .waitFor();
    const revoked = invitationsTable.getByRole('row').filter({ hasText: 'hazel@example.org' });
    await expect
      .poll(() => revoked.filter({ hasText: 'no longer works (revoked)' }).count())
      .toBe(2);
    await expect.poll(() => revoked.filter({ hasText: /works until/ }).count()).toBe(0);
  });

  it('says plainly that the last admin must stay, without "Conflict:"', async () => {
    const page = await signInAs(live.browser, live.server.url, 'admin', undefined, '/people');
    const adminRow = page.getByRole('row').filter({ hasText: 'admin@printwarden.test' });
    await adminRow.getByRole('combobox').selectOption('viewer');
    const alert = page.getByRole('alert').filter({ hasText: /last active admin/ });
    await alert.waitFor();
    await expect.poll(() => alert.textContent()).not.toMatch(/Conflict/);
  });
});

describe('areas a role may not open', () => {
  it('shows a viewer one plain page for Checklists and for Places', async () => {
    const page = await signInAs(live.browser, live.server.url, 'viewer');
    for (const [path, area] of [
      ['/checklists', 'Checklists'],
      ['/places', 'Places'],
    ] as const) {
      await page.goto(`${live.server.url}${path}`);
      await page.getByRole('heading', { name: `${area} are not open to your role` }).waitFor();
      await page.getByText(/As a viewer you can read catalogue records/).waitFor();
      await page.getByText(/are for curators, conservators, archivists and admins\./).waitFor();
      await expect.poll(() => page.getByText('Forbidden').count()).toBe(0);
      await expect.poll(() => page.getByText(/No checklists yet/).count()).toBe(0);
      await expectAccessible(page);
    }
  });
});

// Last in the file: it leaves the demo admin deactivated.
describe('an admin deactivating their own account', () => {
  it('is told exactly what happens, then is signed out and cannot sign in again', async () => {
    const page = await signInAs(live.browser, live.server.url, 'admin', undefined, '/people');
    // Another admin first: the last active admin may not leave.
    const archivistRow = page.getByRole('row').filter({ hasText: 'archivist@printwarden.test' });
    await archivistRow.getByRole('combobox').selectOption('admin');
    await page
      .getByRole('status')
      .getByText(/is now an admin/)
      .waitFor();

    const ownRow = page.getByRole('row').filter({ hasText: 'admin@printwarden.test' });
    await ownRow.getByRole('button', { name: /^Deactivate/ }).click();
    const ask = page.getByRole('dialog', { name: 'Deactivate your own account?' });
    await ask.waitFor();
    await expect
      .poll(() => ask.textContent())
      .toContain(
        'You will be signed out straight away, on every device. You cannot sign in again until another admin reactivates your account on this page.',
      );
    await ask.getByRole('button', { name: 'Deactivate my account' }).click();
    await page.getByRole('heading', { name: 'Sign in', level: 2 }).waitFor();

    await page.getByLabel('E-mail').fill('admin@printwarden.test');
    await page.getByLabel('Password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('alert').waitFor();
    await expect.poll(() => page.url()).toMatch(/\/sign-in$/);
  });
});
