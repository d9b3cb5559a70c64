export {
  createLineSchema,
  createOrderSchema,
  orderListQuerySchema,
  reorderLinesSchema,
  reviewSchema,
  updateLineSchema,
  type OrderListQuery,
} from '../../../shared/api/orders';
