import { useEffect, useState } from 'react';
import { Image, StyleSheet, View } from 'react-native';
import { ActivityIndicator, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { apiBlob } from '@/hooks/api-client';
import type { Attachment } from '@/hooks/use-systems';

const KIND_WORDS: Record<Attachment['kind'], string> = { nameplate: 'Nameplate', install: 'Install' };

/** A photo fetched with the session token (photos are never served without one) and shown from a blob URL. */
export function PhotoThumb({ photo }: { photo: Attachment }) {
  const [uri, setUri] = useState<string | null>(null);
  const [failed, setFailed] = useState(false);
  useEffect(() => {
    let url: string | null = null;
    let live = true;
    apiBlob(photo.url.replace(/^\/api/, ''))
      .then((blob) => {
        if (!live) return;
        url = URL.createObjectURL(blob);
        setUri(url);
      })
      .catch(() => live && setFailed(true));
    return () => {
      live = false;
      if (url) URL.revokeObjectURL(url);
    };
  }, [photo.url]);
  const label = `${KIND_WORDS[photo.kind]} photo ${photo.fileName}`;
  return (
    <View style={styles.tile} testID={`photo-${photo.id}`}>
      {uri ? (
        <Image source={{ uri }} style={styles.image} accessibilityLabel={label} resizeMode="cover" />
      ) : failed ? (
        <Text variant="bodySmall">Photo could not be loaded.</Text>
      ) : (
        <ActivityIndicator accessibilityLabel="Loading photo" />
      )}
      <Text variant="labelMedium">{KIND_WORDS[photo.kind]}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  tile: { width: 120, gap: spacing.xs, alignItems: 'center' },
  image: { width: 120, height: 120, borderRadius: 8 },
});
