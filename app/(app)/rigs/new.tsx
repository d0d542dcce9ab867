import { NewRigScreen } from '@/components/rigs/new-rig-screen';

export default function NewRigRoute() {
  return <NewRigScreen />;
}
