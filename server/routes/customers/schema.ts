export { listQuerySchema } from '../../../shared/api/list';
