import type { CreateCustomerInput, UpdateCustomerInput } from '../../shared/api/customers';
import type { CreateJobInput, UpdateJobInput } from '../../shared/api/jobs';
import { Customer, Job, type User } from '../models';
import { audit } from './audit';

/** The sales desk adds a builder company to its plant. */
export async function createCustomer(actor: User, input: CreateCustomerInput) {
  return Customer.sequelize!.transaction(async (t) => {
    const customer = await Customer.create(
      {
        plantId: actor.plantId,
        name: input.name,
        email: input.email,
        phone: input.phone ?? null,
        terms: input.terms,
        billingAddress: input.billingAddress ?? null,
        city: input.city ?? null,
        contacts: input.contacts,
      },
      { transaction: t },
    );
    await audit(t, {
      plantId: actor.plantId,
      actorId: actor.id,
      action: 'customer.created',
      subjectType: 'customer',
      subjectId: customer.id,
      data: { name: customer.name },
    });
    return customer;
  });
}

/** Edit a builder company's details, terms or contacts. */
export async function updateCustomer(actor: User, customer: Customer, input: UpdateCustomerInput) {
  return Customer.sequelize!.transaction(async (t) => {
    await customer.update(input, { transaction: t });
    await audit(t, {
      plantId: actor.plantId,
      actorId: actor.id,
      action: 'customer.updated',
      subjectType: 'customer',
      subjectId: customer.id,
      data: { fields: Object.keys(input) },
    });
    return customer;
  });
}

/** Add a building site to a builder. */
export async function createJob(actor: User, customer: Customer, input: CreateJobInput) {
  return Job.sequelize!.transaction(async (t) => {
    const job = await Job.create(
      {
        plantId: customer.plantId,
        customerId: customer.id,
        name: input.name,
        address: input.address,
        planRevision: input.planRevision ?? null,
        criteria: input.criteria,
      },
      { transaction: t },
    );
    await audit(t, {
      plantId: actor.plantId,
      actorId: actor.id,
      action: 'job.created',
      subjectType: 'job',
      subjectId: job.id,
      data: { name: job.name, customerId: customer.id },
    });
    return job;
  });
}

/** Edit a job: address, plan revision or its design criteria. */
export async function updateJob(actor: User, job: Job, input: UpdateJobInput) {
  return Job.sequelize!.transaction(async (t) => {
    await job.update(input, { transaction: t });
    await audit(t, {
      plantId: actor.plantId,
      actorId: actor.id,
      action: 'job.updated',
      subjectType: 'job',
      subjectId: job.id,
      data: { fields: Object.keys(input) },
    });
    return job;
  });
}
