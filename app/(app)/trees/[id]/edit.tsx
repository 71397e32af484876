import { useLocalSearchParams } from 'expo-router';
import { TreeEditor } from '@/components/authoring/tree-editor';

/** /trees/:id/edit: the tree's draft in the editor (leads and owners). */
export default function TreeEditScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <TreeEditor treeId={/^\d+$/.test(id ?? '') ? Number(id) : 0} />;
}
