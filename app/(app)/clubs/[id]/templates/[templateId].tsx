import { useLocalSearchParams } from 'expo-router';

import { TemplateScreen } from '@/components/templates/template-screen';

export default function TemplateRoute() {
  const { id, templateId } = useLocalSearchParams<{ id: string; templateId: string }>();
  return <TemplateScreen clubId={id ?? ''} templateId={templateId ?? ''} />;
}
