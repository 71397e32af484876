import { TreeLibrary } from '@/components/trees/tree-library';

/** /trees: the shop's tree library by symptom, with search and install-type filter. */
export default function TreesScreen() {
  return <TreeLibrary />;
}
