/** The preview body is the design input itself, checked by the shared `designInputSchema`. */
export { designInputSchema } from '../../../shared/api/design';
