import { useLocalSearchParams } from 'expo-router';
import { HistoryView } from '@/components/authoring/history-view';

/** /trees/:id/history: versions with who, when and why, and the difference between any two. */
export default function TreeHistoryScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <HistoryView treeId={/^\d+$/.test(id ?? '') ? Number(id) : 0} />;
}
