import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser } from './support/browser';
import { demo } from './support/demo';
import { mailboxLink } from './support/mailbox-link';
import { screenshot } from './support/screenshot';
import { signIn } from './support/sign-in';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function newPage(): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 860 }, locale: 'en-GB' });
  return context.newPage();
}

describe('an administrator bringing a new consultant onto an engagement', () => {
  const stamp = Date.now();
  const email = `hollis.${stamp}@sojourn.test`;
  const engagementName = `Depot repair bays ${stamp}`;

  it('invites the person, who follows the e-mailed link, sets a password and is signed in', async () => {
    const admin = await newPage();
    await signIn(admin, 'admin');
    await admin.getByRole('link', { name: 'People' }).click();
    await admin.getByRole('button', { name: 'Invite a person' }).click();
    await admin.getByLabel('E-mail').fill(email);
    await admin.getByLabel('Name', { exact: true }).fill('Hollis Varga');
    await admin.getByLabel('Role', { exact: true }).selectOption('consultant');
    await admin.getByRole('button', { name: 'Send invitation', exact: true }).click();
    await admin.getByRole('cell', { name: email, exact: true }).waitFor();

    const link = await mailboxLink(admin, email);
    await screenshot(admin, 'journey-mailbox');
    await admin.context().close();

    const invitee = await newPage();
    await invitee.goto(link);
    await invitee.getByRole('heading', { name: 'Join Sojourn' }).waitFor();
    expect(await invitee.getByText(email).count()).toBeGreaterThan(0);
    await invitee.getByLabel('Password', { exact: true }).fill('a sentence for a password');
    await invitee.getByLabel('Repeat the password').fill('a sentence for a password');
    await invitee.getByRole('button', { name: 'Accept and sign in' }).click();
    await invitee.getByTestId('current-user-name').filter({ hasText: 'Hollis Varga' }).waitFor();
    await invitee.getByText('No engagements yet').waitFor();
    await screenshot(invitee, 'journey-invitee-first-screen');
    await invitee.context().close();
  });

  it('creates an engagement and adds the new person, who then sees it', async () => {
    const admin = await newPage();
    await signIn(admin, 'admin');
    await admin.getByRole('link', { name: 'Engagement admin' }).click();
    await admin.getByRole('button', { name: 'New engagement' }).click();
    await admin.getByLabel('Engagement name').fill(engagementName);
    await admin.getByLabel('Client').fill('Greyhollow Tram Works');
    await admin.getByLabel('Description').fill('Repair bays needed so that no more than one tram in twenty waits over a shift.');
    await admin.getByRole('button', { name: 'Create engagement' }).click();
    await admin.getByRole('heading', { name: engagementName, level: 1 }).waitFor();
    await admin.getByLabel('Person').selectOption({ label: `Hollis Varga (${email}) · Consultant` });
    await admin.getByRole('button', { name: 'Add to engagement' }).click();
    await admin.getByRole('cell', { name: email, exact: true }).waitFor();
    await screenshot(admin, 'journey-engagement-with-member');
    await admin.context().close();

    const consultant = await newPage();
    await consultant.goto(`${demo.url}/sign-in`);
    await consultant.getByLabel('E-mail').fill(email);
    await consultant.getByLabel('Password').fill('a sentence for a password');
    await consultant.getByRole('button', { name: 'Sign in' }).click();
    const cards = consultant.getByRole('list', { name: 'Engagements' }).getByRole('listitem');
    await cards.first().waitFor();
    expect(await cards.allTextContents()).toEqual([expect.stringContaining(engagementName)]);
    await consultant.context().close();
  });
});

describe('a person who forgot their password', () => {
  it('requests a link, sets a new password with it, and the link then no longer works', async () => {
    const email = `rowan.${Date.now()}@sojourn.test`;
    const admin = await newPage();
    await signIn(admin, 'admin');
    await admin.goto(`${demo.url}/admin/users`);
    await admin.getByRole('button', { name: 'Invite a person' }).click();
    await admin.getByLabel('E-mail').fill(email);
    await admin.getByLabel('Name', { exact: true }).fill('Rowan Pike');
    await admin.getByLabel('Role', { exact: true }).selectOption('partner');
    await admin.getByRole('button', { name: 'Send invitation', exact: true }).click();
    await admin.getByRole('cell', { name: email, exact: true }).waitFor();
    const invitation = await mailboxLink(admin, email);

    const person = await newPage();
    await person.goto(invitation);
    await person.getByLabel('Password', { exact: true }).fill('first password here');
    await person.getByLabel('Repeat the password').fill('first password here');
    await person.getByRole('button', { name: 'Accept and sign in' }).click();
    await person.getByRole('button', { name: 'Sign out' }).click();
    await person.waitForURL('**/sign-in');
    await person.getByRole('heading', { name: 'Sign in' }).waitFor();

    await person.getByRole('link', { name: 'Forgot your password?' }).click();
    await person.getByLabel('E-mail').fill(email);
    await person.getByRole('button', { name: 'Send reset link' }).click();
    await person.getByRole('heading', { name: 'Check your e-mail' }).waitFor();

    const reset = await mailboxLink(admin, email);
    expect(reset).toContain('/reset-password');
    await person.goto(reset);
    await person.getByLabel('New password', { exact: true }).fill('second password here');
    await person.getByLabel('Repeat the new password').fill('second password here');
    await person.getByRole('button', { name: 'Set password' }).click();
    await person.getByRole('heading', { name: 'Password changed' }).waitFor();

    await person.goto(reset);
    await person.getByLabel('New password', { exact: true }).fill('third password here');
    await person.getByLabel('Repeat the new password').fill('third password here');
    await person.getByRole('button', { name: 'Set password' }).click();
    await person.getByRole('alert').waitFor();
    await screenshot(person, 'journey-reset-link-used');
    await admin.context().close();
    await person.context().close();
  });
});
