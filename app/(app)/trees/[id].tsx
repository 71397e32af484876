import { useLocalSearchParams } from 'expo-router';
import { TreePage } from '@/components/trees/tree-page';

/** /trees/:id: one tree with its steps, cautions and the causes it can reach. */
export default function TreeScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <TreePage id={/^\d+$/.test(id ?? '') ? Number(id) : 0} />;
}
