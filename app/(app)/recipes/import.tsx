import { PlanImportScreen } from '@/components/plans/plan-import-screen';

export default function PlanImportRoute() {
  return <PlanImportScreen />;
}
