import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

/**
 * Placeholder until the truss editor lands: its routes (`orders/:orderId/lines/new`,
 * `orders/:orderId/lines/:lineId`) are children of the signed-in frame.
 */
export function trussEditorRoutes(queryClient: QueryClient): RouteObject[] {
  void queryClient;
  return [];
}
