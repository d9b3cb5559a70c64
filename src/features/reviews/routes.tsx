import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

/**
 * Placeholder until the review screens land: their routes (`reviews`, `reviews/:lineId`) are
 * children of the signed-in frame.
 */
export function reviewRoutes(queryClient: QueryClient): RouteObject[] {
  void queryClient;
  return [];
}
