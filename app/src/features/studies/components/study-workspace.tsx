import {
  MessageBar,
  MessageBarBody,
  MessageBarTitle,
  ProgressBar,
  Spinner,
  makeStyles,
  tokens,
} from '@fluentui/react-components';
import { useState } from 'react';
import { isApiError } from '@/lib/api-client';
import type { HfLink, StudyFrequencyResult } from '@/types/links';
import { formatUtcAndLocal } from '@/utils/format-time';
import { computeOblique } from '../api/compute-oblique';
import { useCreateStudy } from '../api/create-study';
import { useReferenceProfiles } from '../api/get-reference-profiles';
import { useStudy } from '../api/get-study';
import { StudyForm, type StudyRequest } from './study-form';
import { StudyResults, type StudyView } from './study-results';

const useStyles = makeStyles({
  layout: {
    display: 'grid',
    gridTemplateColumns: 'minmax(0, 1fr)',
    gap: tokens.spacingVerticalXL,
    alignItems: 'start',
  },
  side: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
  placeholder: {
    padding: tokens.spacingHorizontalXL,
    color: tokens.colorNeutralForeground3,
    border: `${tokens.strokeWidthThin} dashed ${tokens.colorNeutralStroke1}`,
    borderRadius: tokens.borderRadiusXLarge,
  },
});

interface PreviewState {
  done: number;
  total: number;
  view?: StudyView;
  error?: string;
}

interface StudyWorkspaceProps {
  link: HfLink;
  /** A saved study to show (from the address bar). */
  studyId?: number;
  onSaved: (studyId: number) => void;
}

/** The study form and its results: run and save, or preview through the compute API. */
export function StudyWorkspace({ link, studyId, onSaved }: StudyWorkspaceProps) {
  const styles = useStyles();
  const references = useReferenceProfiles();
  const saved = useStudy(studyId);
  const create = useCreateStudy({ onSuccess: (study) => onSaved(study.id) });
  const [preview, setPreview] = useState<PreviewState | undefined>();

  const run = (request: StudyRequest) => {
    setPreview(undefined);
    create.mutate({
      linkId: link.id,
      atUtc: request.atUtc,
      name: request.name,
      profileSource: request.profileSource,
      frequenciesMHz: request.frequenciesMHz,
    });
  };

  const runPreview = async (request: StudyRequest) => {
    const total = request.frequenciesMHz.length;
    setPreview({ done: 0, total });
    const perFrequency: StudyFrequencyResult[] = [];
    try {
      for (const frequencyMHz of request.frequenciesMHz) {
        const result = await computeOblique({
          profile: request.profile,
          frequencyMHz,
          groundRangeKm: link.distanceKm,
        });
        perFrequency.push({ frequencyMHz, ...result });
        setPreview({ done: perFrequency.length, total });
      }
      setPreview({
        done: total,
        total,
        view: {
          title: `${link.name} at ${formatUtcAndLocal(request.atUtc).utc}`,
          kind: 'preview',
          profile: request.profile,
          groundRangeKm: link.distanceKm,
          perFrequency,
        },
      });
    } catch (error) {
      setPreview({ done: perFrequency.length, total, error: (error as Error).message });
    }
  };

  const fields = isApiError(create.error) ? create.error.fields : undefined;
  const previewBusy = preview !== undefined && !preview.view && !preview.error;

  let view: StudyView | undefined = preview?.view;
  if (!view && !previewBusy && saved.data && saved.data.linkId === link.id) {
    const study = saved.data;
    view = {
      title: `${study.name ? `${study.name} · ` : ''}${link.name} at ${formatUtcAndLocal(study.atUtc).text}`,
      kind: 'saved',
      profile: study.profile,
      groundRangeKm: study.result.groundRangeKm,
      perFrequency: study.result.perFrequency,
    };
  }

  let results;
  if (create.isPending) results = <Spinner label="Running the study…" />;
  else if (previewBusy) {
    results = (
      <div>
        <ProgressBar
          value={preview.total ? preview.done / preview.total : 0}
          aria-label="Preview progress"
        />
        <Spinner
          size="small"
          label={`Computing ${preview.done} of ${preview.total} frequencies…`}
        />
      </div>
    );
  } else if (view) results = <StudyResults key={`${view.kind}-${studyId}`} view={view} />;
  else if (studyId !== undefined && saved.isPending)
    results = <Spinner label="Loading the study…" />;
  else if (studyId !== undefined && saved.isError) {
    results = (
      <MessageBar intent="error" role="alert">
        <MessageBarBody>
          <MessageBarTitle>Could not load the study</MessageBarTitle>
          {saved.error.message}
        </MessageBarBody>
      </MessageBar>
    );
  } else {
    results = (
      <div className={styles.placeholder}>
        Choose a time, a profile and a frequency, then run the study to see the modes, MUFs,
        multipath spread and charts for this link.
      </div>
    );
  }

  return (
    <div className={styles.layout}>
      <div className={styles.side}>
        <StudyForm
          references={references.data?.items ?? []}
          referencesLoading={references.isPending}
          referencesError={references.error?.message}
          busy={create.isPending}
          previewBusy={previewBusy}
          onRun={run}
          onPreview={(request) => void runPreview(request)}
          serverFields={fields}
        />
        {create.error && (
          <MessageBar intent="error" role="alert">
            <MessageBarBody>
              <MessageBarTitle>The study did not run</MessageBarTitle>
              {create.error.message}
            </MessageBarBody>
          </MessageBar>
        )}
        {preview?.error && (
          <MessageBar intent="error" role="alert">
            <MessageBarBody>
              <MessageBarTitle>The preview stopped</MessageBarTitle>
              {preview.error}
            </MessageBarBody>
          </MessageBar>
        )}
      </div>
      <div>{results}</div>
    </div>
  );
}
