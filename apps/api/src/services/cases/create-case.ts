// Opens a case: vehicle, customer, complaint and the latest published version of the chosen
// tree, pinned so later edits to the tree never change this case.
import type { CreateCaseRequest } from '@heatpath/contracts';
import { QueryTypes } from 'sequelize';
import { DiagnosticCase, User } from '../../db/models/index';
import { database, withTransaction } from '../../db/with-transaction';
import { AppError, notFound } from '../../errors';
import { assertCan, can } from '../../policies/permissions';
import type { Actor } from '../../policies/permissions';
import { createCustomer } from '../customers/create-customer';
import { findCustomer } from '../customers/find-customer';
import { getVehicle } from '../vehicles/find-vehicles';
import { latestPublishedVersion } from '../trees/latest-published-version';
import { caseSearchText } from './case-search-text';
import { startNodeOf } from './walk-state';

export async function createCase(options: { actor: Actor; input: CreateCaseRequest }) {
  const { actor, input } = options;
  assertCan(actor, 'cases.create');
  const vehicle = await getVehicle({ actor, vehicleId: input.vehicleId });

  let assignedTo: string | null = null;
  if (input.assignedTo) {
    if (input.assignedTo !== actor.userId && !can(actor, 'cases.assign')) {
      throw new AppError('forbidden', 'Only a lead can assign a case to someone else.');
    }
    const assignee = await User.findOne({
      where: { id: input.assignedTo, workshopId: actor.workshopId, active: true },
    });
    if (!assignee) throw notFound('That technician');
    if (!['technician', 'lead'].includes(assignee.role))
      throw new AppError('bad_request', 'Cases are assigned to a technician or a lead.');
    assignedTo = assignee.id;
  } else if (actor.role === 'technician') {
    assignedTo = actor.userId;
  }

  return withTransaction(async (transaction) => {
    const version = await latestPublishedVersion({ actor, treeId: input.treeId, transaction });
    let customerId = input.customerId ?? vehicle.customerId ?? null;
    let customerName = vehicle.customer?.name ?? null;
    if (input.customerId)
      customerName = (await findCustomer({ actor, customerId: input.customerId, transaction }))
        .name;
    if (input.newCustomer) {
      const customer = await createCustomer({ actor, input: input.newCustomer, transaction });
      customerId = customer.id;
      customerName = customer.name;
      // A car with no owner on file gets the one entered at intake, so it shows next time.
      if (!vehicle.customerId) await vehicle.update({ customerId: customer.id }, { transaction });
    }
    const [counter] = await database().query<{ case_counter: number }>(
      'UPDATE workshops SET case_counter = case_counter + 1 WHERE id = $1 RETURNING case_counter',
      { bind: [actor.workshopId], type: QueryTypes.SELECT, transaction },
    );
    const number = counter?.case_counter;
    if (!number) throw new Error('case counter did not advance');
    return DiagnosticCase.create(
      {
        workshopId: actor.workshopId,
        number,
        vehicleId: vehicle.id,
        customerId,
        complaint: input.complaint,
        mileageAtIntake: input.mileageAtIntake ?? null,
        mileageUnit: input.mileageUnit,
        symptom: version.tree?.symptom ?? '',
        treeVersionId: version.id,
        assignedTo,
        createdBy: actor.userId,
        currentNodeId: startNodeOf(version.definition),
        searchText: caseSearchText({
          number,
          plate: vehicle.plate,
          vin: vehicle.vin,
          customerName,
          make: vehicle.make,
          model: vehicle.model,
        }),
      },
      { transaction },
    );
  });
}
