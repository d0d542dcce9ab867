import { NewSiteScreen } from '@/components/sites/new-site-screen';

export default function NewSiteRoute() {
  return <NewSiteScreen />;
}
