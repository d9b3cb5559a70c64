import type { WhereOptions } from 'sequelize';
import type { Job, StoredFile, User } from '../models';
import { all, hasRole, ownCompany, type Predicate } from './predicates';

/** A builder may remove only what they uploaded themselves. */
const ownUpload: Predicate<StoredFile> = (actor, file) =>
  actor.role !== 'builder' || file.uploadedBy === actor.id;

/**
 * Plan files on a job: the desk uploads and deletes on any job of its plant; a builder uploads to
 * their company's jobs and deletes their own uploads; the reviewer and the foreman read.
 */
export const filePolicy = {
  list: all<Job>(hasRole('admin', 'sales', 'engineer', 'foreman', 'builder'), ownCompany),
  upload: all<Job>(hasRole('admin', 'sales', 'builder'), ownCompany),
  download: all<StoredFile>(
    hasRole('admin', 'sales', 'engineer', 'foreman', 'builder'),
    ownCompany,
  ),
  remove: all<StoredFile>(hasRole('admin', 'sales', 'builder'), ownCompany, ownUpload),
  scope: (actor: User): WhereOptions =>
    actor.role === 'builder'
      ? { plantId: actor.plantId, customerId: actor.customerId! }
      : { plantId: actor.plantId },
};
