import { NewLinkForm } from '@/components/support/new-link-form';

/** /support/new: send a published tree to a customer as a guest link. */
export default function NewGuestLinkScreen() {
  return <NewLinkForm />;
}
