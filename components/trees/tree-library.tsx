import { useState } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import type { InstallType } from '@/trees/tree-format';
import { INSTALL_TYPE_LABELS } from '@/trees/tree-format';
import { useTrees } from '@/hooks/use-trees';
import { Screen } from '@/components/screen';
import { ThemedText } from '@/components/themed-text';
import { Notice } from '@/components/notice';
import { Button } from '@/components/button';
import { TextField } from '@/components/forms/text-field';
import { colors, space } from '@/components/theme';
import { InstallTypeChips } from './install-type-chips';
import { TreeCard } from './tree-card';
import { groupBySymptom } from './group-trees';
import { useDebouncedValue } from './use-debounced-value';
import { LibraryAuthoring } from '@/components/authoring/library-authoring';
import { LoadError } from '@/components/load-error';

/** The Trees screen: the shop's library by symptom, with a text search and install-type chips. */
export function TreeLibrary() {
  const [text, setText] = useState('');
  const [installType, setInstallType] = useState<InstallType | undefined>();
  const q = useDebouncedValue(text.trim(), 300);
  const trees = useTrees({ q: q || undefined, installType });

  return (
    <Screen testID="tree-library">
      <ThemedText variant="title" accessibilityRole="header">
        Trees
      </ThemedText>
      <ThemedText muted>Step-by-step fault finding, grouped by the symptom the car came back with.</ThemedText>
      <LibraryAuthoring />
      <TextField
        label="Search trees"
        placeholder="Words from a title or summary, e.g. idle"
        value={text}
        onChangeText={setText}
        autoCapitalize="none"
        autoCorrect={false}
        returnKeyType="search"
        testID="tree-search"
      />
      <InstallTypeChips value={installType} onChange={setInstallType} />
      <Results query={trees} text={q} installType={installType} onClear={() => (setText(''), setInstallType(undefined))} />
    </Screen>
  );
}

function Results({ query, text, installType, onClear }: { query: ReturnType<typeof useTrees>; text: string; installType?: InstallType; onClear: () => void }) {
  if (query.isPending) {
    return (
      <View style={styles.row} testID="trees-loading">
        <ActivityIndicator color={colors.accent} />
        <ThemedText muted>Loading the tree library…</ThemedText>
      </View>
    );
  }
  if (query.isError) {
    return (
      <LoadError title="Could not load the trees" error={query.error} onRetry={query.refetch} busy={query.isFetching} testID="trees-error" />
    );
  }
  const groups = groupBySymptom(query.data.trees);
  if (groups.length === 0) {
    const filters = [text ? `“${text}”` : '', installType ? INSTALL_TYPE_LABELS[installType] : ''].filter(Boolean).join(' and ');
    return (
      <View style={styles.col} testID="trees-empty">
        <Notice tone="info" title="No trees found">
          {filters ? `No tree matches ${filters}. Try other words or another install type.` : 'This shop has no trees yet.'}
        </Notice>
        {filters ? <Button label="Clear search and filter" kind="secondary" onPress={onClear} testID="trees-clear" /> : null}
      </View>
    );
  }
  return (
    <View style={styles.col} testID="trees-results">
      {groups.map((g) => (
        <View key={g.symptom} style={styles.group} testID={`symptom-${g.symptom}`}>
          <ThemedText variant="heading" accessibilityRole="header">
            {g.label}
          </ThemedText>
          <View style={styles.cards}>
            {g.trees.map((t) => (
              <TreeCard key={t.id} tree={t} />
            ))}
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  col: { gap: space.xl },
  group: { gap: space.md },
  // Cards wrap into two columns once the screen is wide enough (flexBasis in TreeCard).
  cards: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
});
