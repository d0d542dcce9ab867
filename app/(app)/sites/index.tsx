import { SitesScreen } from '@/components/sites/sites-screen';

export default function SitesRoute() {
  return <SitesScreen />;
}
