// Invitations and password resets in a real browser: the lead invites someone by e-mail; the
// link in the message the SMTP fake received sets their password and signs them in, once. The
// forgot-password page answers the same for any address.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { launch, screenshot, signIn } from './browser';
import type { BrowserSession } from './browser';

const mailDir = process.env.E2E_MAIL_DIR ?? join(process.cwd(), 'test-results', 'mail');

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

/** The set-password link in the newest message the SMTP fake kept for an address. */
function linkSentTo(address: string): Promise<string> {
  // Checked until the message is there (the server's worker polls the outbox), not slept for.
  return vi.waitFor(
    () => {
      const files = (() => {
        try {
          return readdirSync(mailDir).filter((f) => f.endsWith('.eml'));
        } catch {
          return [];
        }
      })().sort();
      for (const file of files.reverse()) {
        // Quoted-printable: join soft line breaks and decode =XX.
        const raw = readFileSync(join(mailDir, file), 'utf8')
          .replace(/=\r?\n/g, '')
          .replace(/=([0-9A-F]{2})/g, (_m, hex: string) => String.fromCharCode(parseInt(hex, 16)));
        if (!raw.includes(address)) continue;
        const link = /https?:\/\/\S+\/set-password\?token=[A-Za-z0-9_-]+/.exec(raw)?.[0];
        if (link) return link;
      }
      throw new Error(`no set-password link reached the SMTP fake for ${address}`);
    },
    { timeout: 20_000, interval: 300 },
  );
}

describe('invitations and password links', () => {
  it('the lead invites by e-mail; the link sets a password once and signs the person in', async () => {
    const email = `invited-${Date.now()}@harbourlane.test`;
    const lead = await session.newPage();
    await signIn(lead.page, 'lead@harbourlane.test');
    await lead.page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Staff' })
      .click();
    const form = lead.page.getByRole('form', { name: 'Invite by e-mail' });
    await form.getByLabel('Name').fill('Wenna Polglaze');
    await form.getByLabel('E-mail address').fill(email);
    await form.getByLabel('Role').selectOption('advisor');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await lead.page.getByText('Invitation written').waitFor();
    await lead.page.getByText('Invited, no password yet').first().waitFor();
    await lead.context.close();

    const link = new URL(await linkSentTo(email));
    const invitee = await session.newPage({ width: 390, height: 844 });
    await invitee.page.goto(link.pathname + link.search);
    await invitee.page.getByText(/Welcome to Harbour Lane Garage, Wenna Polglaze/).waitFor();
    await invitee.page.getByLabel('New password').fill('wenna-first-password');
    await invitee.page.getByLabel('The same password again').fill('wenna-first-password');
    await screenshot(invitee.page, 'set-password-phone');
    await invitee.page.getByRole('button', { name: 'Set password and sign in' }).click();
    await invitee.page.getByRole('heading', { name: /Hello, Wenna Polglaze/ }).waitFor();
    await invitee.context.close();

    const again = await session.newPage();
    await again.page.goto(link.pathname + link.search);
    await again.page.getByText('This link no longer works', { exact: true }).waitFor();
    expect(await again.page.getByRole('link', { name: 'Ask for a new link' }).count()).toBe(1);
    await again.context.close();
  });

  it('forgot password answers the same for a known and an unknown address', async () => {
    const answers: string[] = [];
    for (const email of ['tech@harbourlane.test', 'nobody@harbourlane.test']) {
      const { page, context } = await session.newPage({ width: 390, height: 844 });
      await page.goto('/sign-in');
      await page.getByRole('link', { name: 'Forgot your password?' }).click();
      await page.getByLabel('E-mail address').fill(email);
      await page.getByRole('button', { name: 'Send me a link' }).click();
      const status = page.getByRole('status').filter({ hasText: 'Check your e-mail' });
      await status.waitFor();
      answers.push((await status.textContent()) ?? '');
      await context.close();
    }
    expect(answers[0]).toBe(answers[1]);
    expect(await linkSentTo('tech@harbourlane.test')).toMatch(/set-password\?token=/);
  });
});
