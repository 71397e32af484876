import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { AvailableAnswer } from '@/trees/engine-types';
import type { WalkDetail } from '@/shared/schemas/walks';
import { TextField } from '@/components/forms/text-field';
import { Button } from '@/components/button';
import { colors, fonts, radius, space, type } from '@/components/theme';
import { STEP_KIND_WORDS } from '@/shared/walk-words';
import type { WalkSource } from './walk-source';
import type { useStepSender } from './use-step-sender';
import { CautionPanel } from './caution-panel';
import { MarkdownText } from '@/components/markdown';
import { AnswerButtons } from './answer-buttons';
import { ReadingForm } from './reading-form';
import { PhotoPanel } from './photo-panel';
import { FinishPanel } from './finish-panel';


interface Props {
  walk: WalkDetail;
  source: WalkSource;
  sender: ReturnType<typeof useStepSender>;
  answers: AvailableAnswer[];
}

/** The current step: cautions first, then the question, its text, the answers or reading, a note and photos. */
export function StepView({ walk, source, sender, answers }: Props) {
  const stepId = walk.position.stepId;
  const meta = walk.doc.machine.states[stepId].meta;
  const [note, setNote] = useState('');
  const [finishing, setFinishing] = useState(false);
  const final = walk.position.final;
  const photos = walk.photos.filter((p) => p.step === stepId);

  return (
    <View style={styles.wrap} testID={`step-${stepId}`}>
      <CautionPanel cautions={meta.cautions} />
      <View style={styles.card}>
        <Text style={styles.kind}>
          {final ? '■' : '●'} {STEP_KIND_WORDS[meta.kind]} · step {walk.position.stepsTaken + 1}
        </Text>
        <Text style={styles.title} accessibilityRole="header" testID="step-title">
          {meta.title}
        </Text>
        <MarkdownText markdown={meta.body} />
        {meta.kind === 'cause' ? (
          <View style={styles.result} testID="step-cause">
            <Text style={styles.resultHead}>✔ {meta.cause.area}</Text>
            <Text style={styles.body}>Fix: {meta.cause.fix}</Text>
          </View>
        ) : null}
        {meta.kind === 'refer' ? (
          <View style={styles.result} testID="step-refer">
            <Text style={styles.resultHead}>➜ Hand over to {meta.refer.to}</Text>
            <Text style={styles.body}>{meta.refer.reason}</Text>
          </View>
        ) : null}
        {meta.kind === 'reading' && answers[0] ? (
          <ReadingForm
            doc={walk.doc}
            params={meta.reading}
            answer={answers[0]}
            ctx={walk.walk.context}
            shopUnit={walk.shop.pressureUnit}
            busy={sender.busy}
            onSubmit={(event, words) => void sender.answer(event, note.trim() || null, `the reading ${words}`)}
          />
        ) : null}
        {(meta.kind === 'ask' || meta.kind === 'action') && answers.length ? (
          <AnswerButtons answers={answers} busy={sender.busy} onAnswer={(a) => void sender.answer({ type: a.event }, note.trim() || null, `“${a.label}”`)} />
        ) : null}
        {/* After the answers: on a phone the one tap most steps need stays on the first screen, under the instructions. */}
        {final ? null : (
          <TextField
            label="Note (optional): type it before you answer"
            value={note}
            onChangeText={setNote}
            multiline
            numberOfLines={2}
            placeholder="What you saw, part numbers, torque…"
            testID="step-note"
          />
        )}
      </View>
      <View style={styles.card}>
        <PhotoPanel source={source} stepId={stepId} photos={photos} prompts={meta.photoPrompts} readOnly={false} />
      </View>
      {final ? (
        <View style={styles.card}>
          <Text style={styles.sectionHead}>Finish the walk</Text>
          <FinishPanel meta={meta} onFinish={source.finish} />
        </View>
      ) : finishing ? (
        <View style={styles.card}>
          <Text style={styles.sectionHead}>Stop here and finish</Text>
          <FinishPanel meta={meta} onFinish={source.finish} />
          <Button label="Keep walking" kind="secondary" onPress={() => setFinishing(false)} />
        </View>
      ) : (
        <Button label="Stop here and finish…" kind="secondary" onPress={() => setFinishing(true)} testID="walk-finish-early" />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  card: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.md },
  kind: { fontFamily: fonts.semibold, fontSize: 14, color: colors.inkMuted, textTransform: 'uppercase', letterSpacing: 0.5 },
  title: { ...type.heading, color: colors.ink },
  body: { ...type.body, color: colors.ink },
  result: { gap: space.xs, padding: space.md, borderRadius: radius.md, backgroundColor: colors.okSoft, borderLeftWidth: 6, borderLeftColor: colors.ok },
  resultHead: { fontFamily: fonts.bold, fontSize: 18, color: colors.ink },
  sectionHead: { ...type.subheading, color: colors.ink },
});
