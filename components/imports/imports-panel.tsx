import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ProgressBar, Text } from 'react-native-paper';
import { spacing } from '@/constants/theme';
import { errorText } from '@/hooks/error-text';
import { headerProblemOf, useImports, useUploadPreview, type HeaderProblem, type ImportDetail } from '@/hooks/use-imports';
import { MessageBanner } from '@/components/ui/message-banner';
import { Screen } from '@/components/ui/screen';
import { SectionCard } from '@/components/ui/section-card';
import { ColumnMappingForm } from './column-mapping-form';
import { ImportHistory } from './import-history';
import { ImportPreview } from './import-preview';
import { pickCsv } from './pick-csv';
import { TemplateLinks } from './template-links';
import { UploadForm, type UploadChoice } from './upload-form';

const START: UploadChoice = { kind: 'prices', distributor: '', picked: null, decimal: 'auto' };


/** Admin → Imports: upload a file as a dry run, read the preview, commit it; the history with revert. */
export function ImportsPanel() {
  const [choice, setChoice] = useState<UploadChoice>(START);
  const [preview, setPreview] = useState<ImportDetail | null>(null);
  const upload = useUploadPreview();
  const history = useImports();
  const known = useMemo(() => [...new Set((history.data ?? []).map((i) => i.distributor).filter((d): d is string => Boolean(d)))].sort(), [history.data]);
  // Kept while a retry with a mapping runs, so the choices stay on screen if it fails again.
  const [headerProblem, setHeaderProblem] = useState<HeaderProblem | null>(null);

  const send = (mapping?: Record<string, string>) => {
    if (!choice.picked) return;
    setPreview(null);
    upload.mutate(
      { file: choice.picked.file, fileName: choice.picked.name, kind: choice.kind, distributor: choice.kind === 'prices' ? choice.distributor.trim() : undefined, mapping, decimalConvention: choice.kind === 'prices' && choice.decimal !== 'auto' ? choice.decimal : undefined },
      {
        onSuccess: (view) => {
          setHeaderProblem(null);
          setPreview(view);
        },
        onError: (err) => setHeaderProblem(headerProblemOf(err)),
      },
    );
  };
  const pick = async () => {
    const picked = await pickCsv();
    if (picked) {
      upload.reset();
      setHeaderProblem(null);
      setPreview(null);
      setChoice((c) => ({ ...c, picked }));
    }
  };
  const startOver = () => {
    upload.reset();
    setHeaderProblem(null);
    setPreview(null);
    setChoice((c) => ({ ...c, picked: null }));
  };

  return (
    <Screen title="Imports" subtitle="Catalog and distributor price files: check them first, then commit; any import can be reverted.">
      <SectionCard title="Upload a file">
        <UploadForm
          value={choice}
          knownDistributors={known}
          busy={upload.isPending}
          onChange={(next) => {
            if (next.kind !== choice.kind) {
              upload.reset();
              setHeaderProblem(null);
            }
            setChoice(next);
          }}
          onPick={pick}
          onSubmit={() => send()}
        />
        {upload.isPending ? (
          <View style={styles.gap} testID="import-progress">
            <View style={styles.progress}>
              <ProgressBar indeterminate />
            </View>
            <Text variant="bodyMedium">Uploading and checking every row…</Text>
          </View>
        ) : null}
        {upload.isError && !headerProblem ? (
          <MessageBanner tone="error" testID="import-error">
            {errorText(upload.error)}
          </MessageBanner>
        ) : null}
      </SectionCard>
      {headerProblem ? (
        <ColumnMappingForm
          key={headerProblem.foundColumns.join('|')}
          problem={headerProblem}
          distributor={choice.kind === 'prices' ? choice.distributor.trim() : undefined}
          busy={upload.isPending}
          onRetry={(mapping) => send(mapping)}
        />
      ) : null}
      {preview ? <ImportPreview preview={preview} onCommitted={setPreview} onDiscard={startOver} /> : null}
      <SectionCard title="Templates">
        <TemplateLinks />
      </SectionCard>
      <SectionCard title="History">
        <ImportHistory />
      </SectionCard>
    </Screen>
  );
}

// Paper's ProgressBar is 100% tall on the web: the wrapper gives it its 4 px.
const styles = StyleSheet.create({ gap: { gap: spacing.sm }, progress: { height: 4 } });
