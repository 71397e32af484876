import { PeopleScreen } from '@/components/settings/people-screen';

/** /settings/people (owner). */
export default function PeopleRoute() {
  return <PeopleScreen />;
}
