import type { TaskListName } from '../../shared/api/tasks';
import { hasRole, isStaff, type Predicate } from './predicates';

/**
 * Task lists of the home pages: every staff role has some; a builder's home is the portal.
 * Each list is scoped to the actor's plant by the query that fills it.
 */
export const tasksPolicy = {
  show: isStaff,
  lists: {
    sentBack: hasRole('admin', 'sales'),
    outOfDate: hasRole('admin', 'sales'),
    waitingReview: hasRole('admin', 'engineer'),
    newPlans: hasRole('admin', 'sales', 'engineer'),
    releasedToShop: hasRole('admin', 'foreman'),
  } satisfies Record<TaskListName, Predicate>,
};
