// Vehicles and customers as the API returns them.
import type { Customer as CustomerJson, Vehicle as VehicleJson } from '@heatpath/contracts';
import { checkVin } from '@heatpath/contracts';
import type { Customer, Vehicle } from '../db/models/index';

export function presentCustomer(customer: Customer): CustomerJson {
  return { id: customer.id, name: customer.name, phone: customer.phone, email: customer.email };
}

export function presentVehicle(vehicle: Vehicle): VehicleJson {
  return {
    id: vehicle.id,
    vin: vehicle.vin,
    vinWarning: vehicle.vin ? checkVin(vehicle.vin).warning : null,
    plate: vehicle.plate,
    make: vehicle.make,
    model: vehicle.model,
    year: vehicle.year,
    engine: vehicle.engine,
    fuel: vehicle.fuel,
    mileage: vehicle.mileage,
    mileageUnit: vehicle.mileageUnit,
    customer: vehicle.customer ? presentCustomer(vehicle.customer) : null,
  };
}
