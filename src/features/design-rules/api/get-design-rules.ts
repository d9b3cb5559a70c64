import { queryOptions, useQuery } from '@tanstack/react-query';
import { designRulesDetailSchema } from '../../../../shared/api/plant';
import { api } from '../../../lib/api-client';
import { designRulesKeys } from './keys';

/** `GET /api/plant/design-rules` query options: the rules and the version to send back. */
export const designRulesQueryOptions = () =>
  queryOptions({
    queryKey: designRulesKeys.current(),
    queryFn: ({ signal }) =>
      api.request('/api/plant/design-rules', { schema: designRulesDetailSchema, signal }),
  });

/** The plant's design rules. */
export const useDesignRules = () => useQuery(designRulesQueryOptions());
