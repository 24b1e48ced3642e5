import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { useUploadPhoto, type Attachment, type SystemRecord } from '@/hooks/use-systems';
import { MessageBanner } from '@/components/ui/message-banner';
import { SectionCard } from '@/components/ui/section-card';
import { PhotoPickButton } from './photo-picker';
import { PhotoThumb } from './photo-thumb';

/** Nameplate and install photos of this record: taken or picked on the phone, at most 10 MB each. */
export function PhotosCard({ record }: { record: SystemRecord }) {
  const upload = useUploadPhoto(record.jobId);
  const [done, setDone] = useState<string | null>(null);
  const add = (kind: Attachment['kind']) => (photo: { file: Blob | { uri: string; name: string; type: string }; name: string }) => {
    setDone(null);
    upload.mutate({ file: photo.file, fileName: photo.name, kind, systemId: record.id }, { onSuccess: () => setDone('Photo added.') });
  };
  return (
    <SectionCard title="Photos" testID="photos-card">
      <Text variant="bodySmall">A nameplate photo lets the office confirm models and serial numbers. JPEG, PNG, WebP or HEIC up to 10 MB.</Text>
      <View style={styles.buttons}>
        <PhotoPickButton label="Nameplate photo" icon="camera-outline" disabled={upload.isPending} onPicked={add('nameplate')} testID="photo-nameplate" />
        <PhotoPickButton label="Install photo" icon="image-plus" disabled={upload.isPending} onPicked={add('install')} testID="photo-install" />
      </View>
      {upload.isPending ? <Text variant="bodyMedium">Uploading…</Text> : null}
      {upload.isError ? <MessageBanner tone="error">{errorText(upload.error)}</MessageBanner> : null}
      {done && !upload.isPending ? (
        <MessageBanner tone="success" testID="photo-added">
          {done}
        </MessageBanner>
      ) : null}
      {record.attachments.length === 0 ? <Text variant="bodyMedium">No photos yet.</Text> : null}
      <View style={styles.photos}>
        {record.attachments.map((p) => (
          <PhotoThumb key={p.id} photo={p} />
        ))}
      </View>
    </SectionCard>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  photos: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
