export { priceCuttingPlan } from './price-cutting-plan';
export { priceCuttingPlanInputSchema } from './price-cutting-plan-input-schema';
export { toPence } from './money';
export type { CuttingPlanPrice, PriceCuttingPlanInput, PricedBoard, PriceLine } from './pricing-types';
