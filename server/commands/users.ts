import bcrypt from 'bcryptjs';
import { UniqueConstraintError } from 'sequelize';
import type { CreateUserInput, UpdateUserInput } from '../../shared/api/users';
import { Customer, User } from '../models';
import { badRequest, conflict } from '../errors';
import { audit } from './audit';

export const BCRYPT_COST = 12;

/** Plant manager adds a user to their plant (a builder user to one of the plant's customers). */
export async function createUser(actor: User, input: CreateUserInput) {
  const sequelize = User.sequelize!;
  return sequelize.transaction(async (t) => {
    let customerId: number | null = null;
    if (input.role === 'builder') {
      const customer = await Customer.findOne({
        where: { id: input.customerId!, plantId: actor.plantId },
        transaction: t,
      });
      if (!customer)
        throw badRequest('Pick one of your builder companies.', {
          customerId: 'Unknown builder company',
        });
      customerId = customer.id;
    }
    try {
      const user = await User.create(
        {
          plantId: actor.plantId,
          customerId,
          email: input.email,
          name: input.name,
          role: input.role,
          passwordHash: await bcrypt.hash(input.password, BCRYPT_COST),
          lastSignInAt: null,
        },
        { transaction: t },
      );
      await audit(t, {
        plantId: actor.plantId,
        actorId: actor.id,
        action: 'user.created',
        subjectType: 'user',
        subjectId: user.id,
        data: { email: user.email, role: user.role },
      });
      return user;
    } catch (e) {
      if (e instanceof UniqueConstraintError)
        throw conflict('A user with that e-mail already exists.', { email: 'Already in use' });
      throw e;
    }
  });
}

/**
 * Rename, change role, (de)activate or reset the password of a user of the actor's plant. A reset
 * password ends the user's other sessions (all but `currentSessionId`, the actor's own request).
 */
export async function updateUser(
  actor: User,
  user: User,
  input: UpdateUserInput,
  currentSessionId = '',
) {
  if (
    user.id === actor.id &&
    (input.active === false || (input.role && input.role !== actor.role))
  ) {
    throw badRequest('You cannot deactivate yourself or change your own role.');
  }
  if (input.role && (input.role === 'builder') !== (user.role === 'builder')) {
    throw badRequest(
      'Staff and builder accounts cannot be switched into each other; add a new user instead.',
      { role: 'Not allowed for this user' },
    );
  }
  return User.sequelize!.transaction(async (t) => {
    const changes: Record<string, unknown> = {};
    if (input.name !== undefined) changes.name = input.name;
    if (input.role !== undefined) changes.role = input.role;
    if (input.active !== undefined) changes.active = input.active;
    if (input.password !== undefined)
      changes.passwordHash = await bcrypt.hash(input.password, BCRYPT_COST);
    await user.update(changes, { transaction: t });
    await audit(t, {
      plantId: actor.plantId,
      actorId: actor.id,
      action: 'user.updated',
      subjectType: 'user',
      subjectId: user.id,
      data: { ...input, password: input.password ? 'changed' : undefined },
    });
    if (input.active === false || input.password !== undefined) {
      // End the user's sessions at once (deserializeUser also refuses a deactivated user).
      await User.sequelize!.query(
        `DELETE FROM session WHERE (sess->'passport'->>'user')::int = :id AND sid <> :keep`,
        {
          replacements: { id: user.id, keep: currentSessionId },
          transaction: t,
        },
      );
    }
    return user;
  });
}

/** Record a successful sign-in. */
export async function recordSignIn(user: User) {
  return User.sequelize!.transaction(async (t) => {
    await user.update({ lastSignInAt: new Date() }, { transaction: t });
    await audit(t, {
      plantId: user.plantId,
      actorId: user.id,
      action: 'user.signed_in',
      subjectType: 'user',
      subjectId: user.id,
    });
  });
}
