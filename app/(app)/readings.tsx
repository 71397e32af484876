import { ReadingsScreen } from '@/components/readings/readings-screen';

/** /readings: the vacuum and fuel-trim calculator for any signed-in staff member. */
export default function Readings() {
  return <ReadingsScreen />;
}
