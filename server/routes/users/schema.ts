export { createUserSchema, updateUserSchema } from '../../../shared/api/users';
export { listQuerySchema } from '../../../shared/api/list';
