import { Redirect } from 'expo-router';

/** Rigs are listed on Rig & site. */
export default function RigsRoute() {
  return <Redirect href="/setup" />;
}
