// Vehicles and customers: intake, lookup before duplicates, VIN rules, isolation.
import { describe, expect, it } from 'vitest';
import { signedIn, testApp } from '../../test/context';
import { createWorkshop, testPassword } from '../../test/factories';

const app = testApp();
const uniquePlate = () => `HP${Math.random().toString(36).slice(2, 7).toUpperCase()}`;

describe('vehicles', () => {
  it('adds a vehicle with a customer and finds it again by plate and by VIN', async () => {
    const { people } = await createWorkshop();
    const advisor = await signedIn(app, people.advisor.email, testPassword);
    const customer = await advisor
      .post('/api/customers')
      .send({ name: 'Morwenna Tregarth', phone: '01632 960111', email: '' });
    expect(customer.status).toBe(201);
    const plate = uniquePlate();
    const created = await advisor.post('/api/vehicles').send({
      vin: '1M8GDM9AXKP042788',
      plate: plate.toLowerCase(),
      make: 'Corvane',
      model: 'Tessel 1.4',
      year: 2017,
      engine: '1.4 turbo petrol',
      fuel: 'petrol',
      mileage: 118400,
      mileageUnit: 'km',
      customerId: customer.body.id,
    });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      plate,
      vin: '1M8GDM9AXKP042788',
      vinWarning: null,
      customer: { name: 'Morwenna Tregarth' },
    });
    const byPlate = await advisor
      .get('/api/vehicles')
      .query({ q: plate.slice(0, 4).toLowerCase() });
    expect(byPlate.body.vehicles.map((v: { id: string }) => v.id)).toContain(created.body.id);
    const byVin = await advisor.get('/api/vehicles').query({ q: '1m8gdm9a' });
    expect(byVin.body.vehicles.map((v: { id: string }) => v.id)).toContain(created.body.id);
  });

  it('refuses a second record for the same plate or VIN with 409', async () => {
    const { people } = await createWorkshop();
    const tech = await signedIn(app, people.technician.email, testPassword);
    const plate = uniquePlate();
    expect(
      (await tech.post('/api/vehicles').send({ plate, make: 'Brisa', model: 'Orlo' })).status,
    ).toBe(201);
    const again = await tech
      .post('/api/vehicles')
      .send({ plate: `${plate.slice(0, 3)} ${plate.slice(3)}`, make: 'Brisa', model: 'Orlo' });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already on file/);
  });

  it('warns on a check-digit mismatch and refuses I, O, Q', async () => {
    const { people } = await createWorkshop();
    const tech = await signedIn(app, people.technician.email, testPassword);
    const warned = await tech
      .post('/api/vehicles')
      .send({ vin: '1M8GDM9A1KP042788', make: 'Brisa', model: 'Orlo' });
    expect(warned.status).toBe(201);
    expect(warned.body.vinWarning).toMatch(/check digit/);
    const refused = await tech
      .post('/api/vehicles')
      .send({ vin: 'OM8GDM9AXKP042788', make: 'Brisa', model: 'Orlo' });
    expect(refused.status).toBe(400);
    expect(refused.body.error.fields.vin).toMatch(/I, O or Q/);
  });

  it('needs a VIN or a plate', async () => {
    const { people } = await createWorkshop();
    const tech = await signedIn(app, people.technician.email, testPassword);
    const res = await tech.post('/api/vehicles').send({ make: 'Brisa', model: 'Orlo' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.plate).toMatch(/VIN or the registration plate/);
  });

  it('never shows or links another workshop’s vehicles or customers', async () => {
    const mine = await createWorkshop();
    const theirs = await createWorkshop();
    const other = await signedIn(app, theirs.people.advisor.email, testPassword);
    const plate = uniquePlate();
    const theirCustomer = await other.post('/api/customers').send({ name: 'Isolde Varga' });
    const theirVehicle = await other
      .post('/api/vehicles')
      .send({ plate, make: 'Brisa', model: 'Orlo' });
    const me = await signedIn(app, mine.people.advisor.email, testPassword);
    expect((await me.get('/api/vehicles').query({ q: plate })).body.vehicles).toEqual([]);
    expect((await me.get(`/api/vehicles/${theirVehicle.body.id}`)).status).toBe(404);
    expect((await me.get('/api/customers').query({ q: 'Isolde' })).body.customers).toEqual([]);
    const linked = await me.post('/api/vehicles').send({
      plate: uniquePlate(),
      make: 'Brisa',
      model: 'Orlo',
      customerId: theirCustomer.body.id,
    });
    expect(linked.status).toBe(404);
  });
});
