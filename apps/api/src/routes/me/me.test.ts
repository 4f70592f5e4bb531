// The signed-in person and their unit preferences.
import { describe, expect, it } from 'vitest';
import { signedIn, testApp } from '../../test/context';
import { createWorkshop, testPassword } from '../../test/factories';

const app = testApp();

describe('/api/me', () => {
  it('starts with metric units and remembers a change across sessions', async () => {
    const { people } = await createWorkshop();
    const first = await signedIn(app, people.technician.email, testPassword);
    expect((await first.get('/api/me')).body.preferences.units).toEqual({
      temperature: 'C',
      pressure: 'bar',
      volume: 'L',
    });
    const res = await first
      .patch('/api/me/preferences')
      .send({ units: { temperature: 'F', pressure: 'psi' } });
    expect(res.status).toBe(200);
    expect(res.body.preferences.units).toEqual({ temperature: 'F', pressure: 'psi', volume: 'L' });
    const second = await signedIn(app, people.technician.email, testPassword);
    expect((await second.get('/api/me')).body.preferences.units.temperature).toBe('F');
  });

  it('refuses an unknown unit', async () => {
    const { people } = await createWorkshop();
    const agent = await signedIn(app, people.technician.email, testPassword);
    const res = await agent.patch('/api/me/preferences').send({ units: { temperature: 'K' } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
  });
});
