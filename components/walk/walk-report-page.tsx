import { ActivityIndicator } from 'react-native';
import type { WalkDetail } from '@/shared/schemas/walks';
import { Screen } from '@/components/screen';
import { Notice } from '@/components/notice';
import { colors } from '@/components/theme';
import { WalkReportView } from './walk-report-view';

/** The report screen around a loaded walk (any data source: staff or guest). */
export function WalkReportPage({ query, pdfHref, backHref }: { query: { data?: WalkDetail; isPending: boolean; error: Error | null }; pdfHref: string | null; backHref: string | null }) {
  return (
    <Screen testID="walk-report-screen">
      {query.data ? (
        <WalkReportView walk={query.data} pdfHref={pdfHref} backHref={backHref} />
      ) : query.isPending ? (
        <ActivityIndicator color={colors.accent} />
      ) : (
        <Notice tone="error" title="Could not open the report">{query.error?.message ?? 'The walk could not be loaded.'}</Notice>
      )}
    </Screen>
  );
}
