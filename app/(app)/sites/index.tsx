import { Redirect } from 'expo-router';

/** Sites are listed on Rig & site, beside the rigs. */
export default function SitesRoute() {
  return <Redirect href="/setup" />;
}
