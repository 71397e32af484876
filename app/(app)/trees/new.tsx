import { TreeCreate } from '@/components/authoring/tree-create';

/** /trees/new: a new tree or an imported tree file, opened as a draft (leads and owners). */
export default function NewTreeScreen() {
  return <TreeCreate />;
}
