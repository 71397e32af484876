import { PatternsScreen } from '@/components/patterns/patterns-screen';

/** /patterns: repeat causes, comebacks and trends across the shop's jobs (owners and leads). */
export default function PatternsRoute() {
  return <PatternsScreen />;
}
