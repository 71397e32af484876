import { useLocalSearchParams } from 'expo-router';
import { WalkReportPage } from '@/components/walk/walk-report-page';
import { useWalk } from '@/hooks/use-walks';

/** /walks/:id/report: the printable report, with the PDF download. */
export default function WalkReportRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const walkId = /^\d+$/.test(id ?? '') ? Number(id) : 0;
  const walk = useWalk(walkId);
  return <WalkReportPage query={walk} pdfHref={`/api/walks/${walkId}/report.pdf`} backHref={`/walks/${walkId}`} />;
}
