import { useState } from 'react';
import { Image, Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import * as ImagePicker from 'expo-image-picker';
import type { WalkPhoto } from '@/shared/schemas/walks';
import { Button } from '@/components/button';
import { Notice } from '@/components/notice';
import { colors, fonts, radius, space, touchTarget, type } from '@/components/theme';
import type { PhotoFile, WalkSource } from './walk-source';

interface Upload {
  key: string;
  file: PhotoFile;
  preview: string;
  progress: number;
  error?: string;
}

/**
 * Photos at the current step: the ones taken so far, and new ones with
 * upload progress. A failed upload stays with a Retry button; the step's
 * answer never waits for it.
 */
export function PhotoPanel({ source, stepId, photos, prompts, readOnly }: { source: WalkSource; stepId: string; photos: WalkPhoto[]; prompts: string[]; readOnly: boolean }) {
  const [uploads, setUploads] = useState<Upload[]>([]);
  const [pickError, setPickError] = useState<string>();
  const patch = (key: string, p: Partial<Upload>) => setUploads((list) => list.map((u) => (u.key === key ? { ...u, ...p } : u)));

  const send = async (u: Upload) => {
    patch(u.key, { progress: 0, error: undefined });
    try {
      await source.uploadPhoto(u.file, stepId, (progress) => patch(u.key, { progress }));
      setUploads((list) => list.filter((x) => x.key !== u.key));
    } catch (err) {
      patch(u.key, { error: err instanceof Error ? err.message : 'The photo did not upload.' });
    }
  };

  const pick = async (camera: boolean) => {
    setPickError(undefined);
    try {
      const options: ImagePicker.ImagePickerOptions = { mediaTypes: ['images'], quality: 0.85, exif: false };
      const res = camera ? await ImagePicker.launchCameraAsync(options) : await ImagePicker.launchImageLibraryAsync(options);
      if (res.canceled || !res.assets?.length) return;
      const a = res.assets[0];
      const name = a.fileName ?? `photo-${Date.now()}.jpg`;
      const file: PhotoFile = a.file ? { blob: a.file, name } : { uri: a.uri, name, type: a.mimeType ?? 'image/jpeg' };
      const u: Upload = { key: `${Date.now()}-${Math.random()}`, file, preview: a.uri, progress: 0 };
      setUploads((list) => [...list, u]);
      await send(u);
    } catch (err) {
      setPickError(err instanceof Error && /Unsupported file type/.test(err.message) ? 'That file is not a photo. Choose a JPEG, PNG or WebP picture.' : 'The photo could not be opened. Try again.');
    }
  };

  return (
    <View style={styles.wrap} testID="photo-panel">
      <Text style={styles.head}>Photos</Text>
      {prompts.map((p) => (
        <Text key={p} style={styles.prompt}>
          Suggested photo: {p}
        </Text>
      ))}
      {photos.length || uploads.length ? (
        <View style={styles.grid}>
          {photos.map((p) => (
            <View key={p.id} testID={`photo-${p.id}`} style={styles.thumbBox}>
              <Image source={{ uri: p.thumbUrl }} style={styles.thumb} accessibilityLabel="Photo taken at this step" accessibilityIgnoresInvertColors />
              {readOnly ? null : (
                <Pressable accessibilityRole="button" accessibilityLabel="Remove this photo" onPress={() => void source.removePhoto(p.id)} style={styles.remove} testID={`photo-remove-${p.id}`}>
                  <Text style={styles.removeText}>✖ Remove</Text>
                </Pressable>
              )}
            </View>
          ))}
          {uploads.map((u) => (
            <View key={u.key} style={styles.thumbBox} testID="photo-uploading">
              <Image source={{ uri: u.preview }} style={[styles.thumb, styles.faded]} />
              <View style={styles.bar}>
                <View style={[styles.fill, { width: `${Math.round(u.progress * 100)}%` }]} />
              </View>
              <Text style={styles.small}>{u.error ? '✖ Not uploaded' : `Uploading ${Math.round(u.progress * 100)} %`}</Text>
            </View>
          ))}
        </View>
      ) : null}
      {uploads
        .filter((u) => u.error)
        .map((u) => (
          <View key={u.key} style={styles.retry}>
            <Notice tone="error" title="Photo not uploaded" testID="photo-error">
              {u.error}
            </Notice>
            <View style={styles.row}>
              <Button label="Retry upload" kind="secondary" onPress={() => void send(u)} testID="photo-retry" />
              <Button label="Drop it" kind="secondary" onPress={() => setUploads((l) => l.filter((x) => x.key !== u.key))} />
            </View>
          </View>
        ))}
      {pickError ? <Notice tone="error">{pickError}</Notice> : null}
      {readOnly ? null : (
        <View style={styles.row}>
          {Platform.OS === 'web' ? null :  <Button label="Take photo" kind="secondary" onPress={() => void pick(true)} testID="photo-camera" />}
          <Button label={Platform.OS === 'web' ? 'Add photo' : 'Choose photo'} kind="secondary" onPress={() => void pick(false)} testID="photo-add" />
        </View>
      )}
    </View>
  );
}

const THUMB = 104;
const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  head: { ...type.label, color: colors.ink },
  prompt: { ...type.small, color: colors.inkMuted },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  thumbBox: { width: THUMB, gap: 2 },
  thumb: { width: THUMB, height: THUMB, borderRadius: radius.sm, backgroundColor: colors.line },
  faded: { opacity: 0.6 },
  remove: { minHeight: touchTarget, justifyContent: 'center' },
  removeText: { fontFamily: fonts.semibold, fontSize: 14, color: colors.danger },
  bar: { height: 6, borderRadius: 3, backgroundColor: colors.line, overflow: 'hidden' },
  fill: { height: 6, backgroundColor: colors.accent },
  small: { ...type.small, color: colors.inkMuted },
  retry: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
