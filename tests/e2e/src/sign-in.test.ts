// Each demo role signs in and sees its own navigation; a wrong password shows the message; the
// lead manages staff and another workshop's lead sees none of it.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launch, screenshot, signIn, submitSignIn } from './browser';
import type { BrowserSession } from './browser';

let session: BrowserSession;
beforeAll(async () => {
  session = await launch();
});
afterAll(async () => {
  await session?.close();
});

const roles = [
  {
    email: 'lead@harbourlane.test',
    role: 'lead',
    sees: ['Staff', 'Calculators'],
    notSees: ['Casebook'],
  },
  {
    email: 'tech@harbourlane.test',
    role: 'technician',
    sees: ['Calculators'],
    notSees: ['Staff', 'Casebook'],
  },
  {
    email: 'apprentice@harbourlane.test',
    role: 'apprentice',
    sees: ['Casebook', 'Calculators'],
    notSees: ['Staff'],
  },
  {
    email: 'advisor@harbourlane.test',
    role: 'advisor',
    sees: ['Calculators'],
    notSees: ['Staff', 'Casebook'],
  },
] as const;

describe('signing in', () => {
  for (const r of roles) {
    it(`${r.role} signs in and sees their own navigation`, async () => {
      const { page, context } = await session.newPage();
      await signIn(page, r.email);
      const nav = page.getByRole('navigation', { name: 'Main' });
      await nav.waitFor();
      for (const label of r.sees)
        await expect(
          nav.getByRole('link', { name: label, exact: false }).first().isVisible(),
        ).resolves.toBe(true);
      for (const label of r.notSees)
        expect(await nav.getByRole('link', { name: label }).count()).toBe(0);
      expect(
        await page.getByText('Harbour Lane Garage').filter({ visible: true }).count(),
      ).toBeGreaterThan(0);
      await screenshot(page, `home-${r.role}`);
      await context.close();
    });
  }

  it('shows one clear message for a wrong password', async () => {
    const { page, context } = await session.newPage({ width: 390, height: 844 });
    await submitSignIn(page, 'lead@harbourlane.test', 'not-the-password');
    const alert = page.getByRole('alert');
    await alert.waitFor();
    expect(await alert.textContent()).toMatch(/do not match an active account/);
    await screenshot(page, 'sign-in-wrong-password-phone');
    await context.close();
  });

  it('the lead adds a technician who can then sign in; the other workshop does not see them', async () => {
    const { page, context } = await session.newPage();
    await signIn(page, 'lead@harbourlane.test');
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Staff' })
      .click();
    const email = `e2e-${Date.now()}@harbourlane.test`;
    const form = page.getByRole('form', { name: 'Add a staff member' });
    await form.getByLabel('Name').fill('Ebba Quill');
    await form.getByLabel('E-mail address').fill(email);
    await form.getByLabel('Role').selectOption('technician');
    await form.getByLabel('First password').fill('first-password-123');
    await form.getByRole('button', { name: 'Add staff member' }).click();
    await page.getByText(email).waitFor();
    await screenshot(page, 'staff-lead');
    await context.close();

    const second = await session.newPage();
    await signIn(second.page, email, 'first-password-123');
    await second.page.getByRole('navigation', { name: 'Main' }).waitFor();
    await second.context.close();

    const other = await session.newPage();
    await signIn(other.page, 'lead@millbrook.test');
    await other.page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('link', { name: 'Staff' })
      .click();
    await other.page.getByText('lead@millbrook.test').waitFor();
    expect(await other.page.getByText(email).count()).toBe(0);
    expect(await other.page.getByText('lead@harbourlane.test').count()).toBe(0);
    await other.context.close();
  });
});
