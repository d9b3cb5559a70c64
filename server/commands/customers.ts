import type { CreateCustomerInput, UpdateCustomerInput } from '../../shared/api/customers';
import type { CreateJobInput, UpdateJobInput } from '../../shared/api/jobs';
import { Op, col, fn, where, type Transaction } from 'sequelize';
import { Customer, Job, Plant, type User } from '../models';
import { AppError } from '../errors';
import { jobDesignLoadsOf } from '../presenters/plant';
import { audit } from './audit';
import { markStaleLines } from './staleLines';

/** The sales desk adds a builder company to its plant. */
export async function createCustomer(actor: User, input: CreateCustomerInput) {
  return Customer.sequelize!.transaction(async (t) => {
    if (!input.confirmDuplicate) await refuseLikelyDuplicate(actor.plantId, input, t);
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

/**
 * Builders are not duplicated silently: the same name (ignoring case and spacing) or e-mail as an
 * existing builder of the plant answers 409 `possible_duplicate` naming it, and the desk confirms.
 */
async function refuseLikelyDuplicate(plantId: number, input: CreateCustomerInput, t: Transaction) {
  const name = input.name.replace(/\s+/g, ' ').toLowerCase();
  const match = await Customer.findOne({
    where: {
      plantId,
      [Op.or]: [
        where(fn('lower', fn('regexp_replace', col('name'), '\\s+', ' ', 'g')), name),
        { email: input.email },
      ],
    },
    transaction: t,
  });
  if (!match) return;
  const sameMail = match.email === input.email;
  const field = sameMail ? 'email' : 'name';
  throw new AppError(
    409,
    'possible_duplicate',
    `${match.name} already exists with ${sameMail ? `the e-mail ${match.email}` : 'that name'}. Open it, or create this builder anyway.`,
    { [field]: `Already used by ${match.name}`, existingId: String(match.id) },
  );
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
    const plant = await Plant.findByPk(job.plantId, { transaction: t });
    const before = jobDesignLoadsOf(plant!, job.criteria ?? {});
    await job.update(input, { transaction: t });
    const after = jobDesignLoadsOf(plant!, job.criteria ?? {});
    await markStaleLines(t, actor, job, before, after, plant!.units === 'imperial' ? 'psf' : 'kPa');
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
