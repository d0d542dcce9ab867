import { AppShell } from '@/components/nav/app-shell';

export default function AppLayout() {
  return <AppShell />;
}
