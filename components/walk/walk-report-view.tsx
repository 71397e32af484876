import { useEffect, type ReactNode } from 'react';
import { Image, Platform, StyleSheet, Text, View } from 'react-native';
import { router } from 'expo-router';
import type { WalkDetail } from '@/shared/schemas/walks';
import { buildWalkReport, type ReportStep } from '@/shared/walk-report';
import type { WalkPhoto } from '@/shared/schemas/walks';
import { Button } from '@/components/button';
import { colors, fonts, radius, space, type } from '@/components/theme';

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' }) : '—');

/** The printable walk report: the same content as the PDF, laid out for the screen and for paper. */
export function WalkReportView({ walk, pdfHref, backHref }: { walk: WalkDetail; pdfHref: string | null; backHref: string | null }) {
  const r = buildWalkReport(walk);
  usePrintStyles();
  return (
    <View style={styles.page} testID="walk-report">
      <View style={styles.actions} testID="report-actions">
        {Platform.OS === 'web' ? <Button label="Print" onPress={() => window.print()} testID="report-print" /> : null}
        {pdfHref && Platform.OS === 'web' ? <Button label="Download PDF" kind="secondary" onPress={() => window.open(pdfHref, '_blank')} testID="report-pdf" /> : null}
        {backHref ? <Button label="Back to the walk" kind="secondary" onPress={() => router.push(backHref as never)} /> : null}
      </View>
      <Text style={styles.h1} accessibilityRole="header">
        {r.title}
      </Text>
      <Text style={styles.muted}>
        {r.shopName} · {r.treeTitle} (version {r.treeVersion})
      </Text>

      <Section title="Job and vehicle">
        {r.job ? (
          <>
            <Field label="Customer" value={r.job.customerName} />
            <Field label="Vehicle" value={r.job.vehicle} />
            <Field label="VIN" value={r.job.vin} />
            <Field label="Mileage" value={r.job.mileage !== null ? r.job.mileage.toLocaleString() : null} />
            <Field label="Install" value={r.job.install.join('; ') || null} />
          </>
        ) : (
          <Field label="Job" value="No job: a walk sent by link" />
        )}
      </Section>

      <Section title="Result">
        <Field label="Outcome" value={r.outcome ?? 'Walk still open'} />
        <Field label={r.end.kind === 'cause' ? 'Cause found' : r.end.kind === 'refer' ? 'Handed over' : 'Stopped at'} value={r.end.title} />
        {r.end.cause ? <Field label="Where" value={r.end.cause.area} /> : null}
        {r.end.cause ? <Field label="Fix" value={r.end.cause.fix} /> : null}
        {r.end.refer ? <Field label="To" value={`${r.end.refer.to}: ${r.end.refer.reason}`} /> : null}
        {r.causeText && r.causeText !== r.end.title ? <Field label="Cause noted" value={r.causeText} /> : null}
        <Field label="Note" value={r.finishNote} />
        <Photos photos={r.end.photos} />
        <Field label="Technician" value={r.technician} />
        <Field label="Started" value={when(r.startedAt)} />
        <Field label="Finished" value={r.finishedAt ? when(r.finishedAt) : null} />
        <Field label="Time spent" value={r.timeSpent} />
      </Section>

      {r.cautions.length ? (
        <Section title="Safety cautions that applied">
          {r.cautions.map((c, i) => (
            <Text key={i} style={styles.body}>
              <Text style={styles.caution}>⚠ Caution · {c.title}: </Text>
              {c.text}
            </Text>
          ))}
        </Section>
      ) : null}

      <Section title={`Steps (${r.steps.length})`}>
        {r.steps.length ? r.steps.map((s, i) => <Step key={s.seq} step={s} n={i + 1} />) : <Text style={styles.body}>No answers recorded yet.</Text>}
      </Section>
      <Text style={styles.muted}>{r.context}</Text>
      {r.undoneCount ? <Text style={styles.muted}>{r.undoneCount} answer(s) were taken back during the walk; the full history is kept in Baywalk.</Text> : null}
    </View>
  );
}

// On paper: no navigation or buttons, and no scroll boxes cutting the report to one screen.
const PRINT_CSS = `@media print {
  [data-testid="nav-bar"], [data-testid="nav-rail"], [data-testid="app-header"], [data-testid="report-actions"] { display: none !important; }
  body * { overflow: visible !important; }
  html, body, #root, #root div { height: auto !important; min-height: 0 !important; }
}`;

function usePrintStyles() {
  useEffect(() => {
    if (Platform.OS !== 'web') return;
    const el = document.createElement('style');
    el.textContent = PRINT_CSS;
    document.head.appendChild(el);
    return () => el.remove();
  }, []);
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.section}>
      <Text style={styles.h2} accessibilityRole="header">
        {title}
      </Text>
      {children}
    </View>
  );
}

function Field({ label, value }: { label: string; value: string | null | undefined }) {
  if (!value) return null;
  return (
    <Text style={styles.body}>
      <Text style={styles.label}>{label}: </Text>
      {value}
    </Text>
  );
}

function Step({ step, n }: { step: ReportStep; n: number }) {
  const icon = step.verdict?.tone === 'ok' ? '✔' : step.verdict?.tone === 'problem' ? '✖' : '⚠';
  return (
    <View style={styles.step} testID={`report-step-${n}`}>
      <Text style={styles.stepTitle}>
        {n}. {step.title}
      </Text>
      <Text style={styles.body}>Answer: {step.answer}</Text>
      {step.verdict ? <Text style={[styles.verdict, { color: step.verdict.tone === 'ok' ? colors.ok : step.verdict.tone === 'problem' ? colors.danger : colors.caution }]}>{`${icon} ${step.verdict.word}`}</Text> : null}
      {step.summary ? <Text style={styles.body}>{step.summary}</Text> : null}
      {step.note ? <Text style={styles.body}>Note: {step.note}</Text> : null}
      <Text style={styles.muted}>{[step.by, when(step.at)].filter(Boolean).join(' · ')}</Text>
      <Photos photos={step.photos} />
    </View>
  );
}

function Photos({ photos }: { photos: WalkPhoto[] }) {
  if (!photos.length) return null;
  return (
    <View style={styles.photos}>
      {photos.map((p) => (
        <Image key={p.id} source={{ uri: p.thumbUrl }} style={styles.thumb} accessibilityLabel="Photo" />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  page: { gap: space.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  h1: { ...type.title, color: colors.ink },
  h2: { ...type.heading, color: colors.accentDark, borderBottomWidth: 1, borderBottomColor: colors.line, paddingBottom: space.xs },
  section: { gap: space.sm },
  body: { ...type.body, color: colors.ink },
  label: { fontFamily: fonts.semibold, color: colors.inkMuted },
  muted: { ...type.small, color: colors.inkMuted },
  caution: { fontFamily: fonts.bold, color: colors.caution },
  step: { gap: 2, paddingVertical: space.sm, borderBottomWidth: 1, borderBottomColor: colors.line },
  stepTitle: { fontFamily: fonts.bold, fontSize: 17, color: colors.ink },
  verdict: { fontFamily: fonts.bold, fontSize: 16 },
  photos: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.xs },
  thumb: { width: 96, height: 96, borderRadius: radius.sm, backgroundColor: colors.line },
});
