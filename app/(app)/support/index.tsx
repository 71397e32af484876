import { SupportInbox } from '@/components/support/support-inbox';

/** /support (owner, lead, support): guest walks to review and every guest link. */
export default function SupportScreen() {
  return <SupportInbox />;
}
