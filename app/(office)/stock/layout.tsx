import { roleGateLayout } from '@/lib/pages/feature-gate';

export default roleGateLayout('stock:receive');
