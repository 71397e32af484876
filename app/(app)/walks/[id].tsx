import { useLocalSearchParams } from 'expo-router';
import { useStaffWalkSource } from '@/hooks/use-walks';
import { WalkScreen } from '@/components/walk/walk-screen';

/** /walks/:id: walk a tree one step at a time. */
export default function WalkRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const source = useStaffWalkSource(/^\d+$/.test(id ?? '') ? Number(id) : 0);
  return <WalkScreen source={source} />;
}
