import { MailScreen } from '@/components/mail/mail-screen';

export default function MailRoute() {
  return <MailScreen />;
}
