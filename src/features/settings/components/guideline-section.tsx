import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useState } from 'react';
import { useForm, type Path } from 'react-hook-form';
import { Link } from 'react-router';
import { customProfileSchema, isProfileKey, profiles, type ProfileKey } from '@shared/rules/index';
import type { Sugarbush } from '@shared/schemas/sugarbush';
import { Button } from '@/components/ui/button';
import { CautionBox } from '@/components/ui/caution-box';
import { paths } from '@/config/paths';
import { applyServerErrors } from '@/lib/form-errors';
import { useUnitSystem } from '@/lib/units';
import { usePreviewGuideline } from '../api/preview-guideline';
import { useUpdateGuideline, type GuidelineChoice } from '../api/update-guideline';
import {
  CUSTOM_PROFILE_KEY,
  customFromProfile,
  customProfileFormSchema,
  editorFieldPaths,
  initialCustomProfile,
  type CustomProfileForm,
  type CustomProfileFormOutput,
} from '../lib/custom-profile-form';
import { messageFor } from '../lib/messages';
import { plainIssues } from '../lib/plain-issues';
import { CustomProfileEditor } from './custom-profile-editor';
import { GuidelinePreviewPanel } from './guideline-preview-panel';
import { ProfileChoices } from './profile-choices';

const savedCustom = (stand: Sugarbush) => {
  const parsed = customProfileSchema.safeParse(stand.customProfile);
  return parsed.success ? parsed.data : undefined;
};

export const guidelineLabel = (stand: Sugarbush) =>
  isProfileKey(stand.profile)
    ? profiles[stand.profile].label
    : (savedCustom(stand)?.label ?? 'Your own figures');

/** The law where it applies, and the foresters who know the stand, come before any table. */
function GuidelineCaution() {
  return (
    <CautionBox title="Guidelines are advice">
      <p>
        Local regulations (Quebec&apos;s, for instance, are law), organic certifiers&apos; rules and
        licensed foresters take precedence over any guideline chosen here.
      </p>
    </CautionBox>
  );
}

/**
 * Which guideline the stand's advice follows. The owner picks a published one or writes the
 * stand's own, sees from the API what it does to this season's plan, then saves or cancels.
 */
export function GuidelineSection({
  stand,
  season,
  canChoose,
}: {
  stand: Sugarbush;
  season: number;
  canChoose: boolean;
}) {
  const { unit } = useUnitSystem();
  const [chosen, setChosen] = useState(stand.profile);
  const [editorSeq, setEditorSeq] = useState(0);
  const [previewed, setPreviewed] = useState<GuidelineChoice>();
  const [formError, setFormError] = useState<string | null>(null);
  const [savedLabel, setSavedLabel] = useState<string>();
  const preview = usePreviewGuideline(stand.id);
  const save = useUpdateGuideline(stand.id);

  const form = useForm<CustomProfileForm, unknown, CustomProfileFormOutput>({
    resolver: zodResolver(customProfileFormSchema, { error: plainIssues(unit) }),
    defaultValues: { customProfile: initialCustomProfile(stand) },
  });

  // A preview stands for the figures it was made from: any change of them sets it aside.
  const { reset: resetPreview } = preview;
  useEffect(() => {
    const subscription = form.watch(() => {
      resetPreview();
      setPreviewed(undefined);
    });
    return () => subscription.unsubscribe();
  }, [form, resetPreview]);

  const place = (error: unknown) =>
    chosen === CUSTOM_PROFILE_KEY
      ? applyServerErrors(
          error,
          form.setError,
          editorFieldPaths(
            form.getValues('customProfile.bands').length,
          ) as Path<CustomProfileForm>[],
          messageFor,
        )
      : messageFor(error);

  const ask = (choice: GuidelineChoice) => {
    setFormError(null);
    setSavedLabel(undefined);
    preview.mutate(
      { choice, season },
      {
        onSuccess: () => setPreviewed(choice),
        onError: (error) => setFormError(place(error)),
      },
    );
  };

  const onPreview = () => {
    if (chosen === CUSTOM_PROFILE_KEY) {
      void form.handleSubmit((values) =>
        ask({ profile: CUSTOM_PROFILE_KEY, customProfile: values.customProfile }),
      )();
    } else ask({ profile: chosen });
  };

  const onSave = () => {
    if (!previewed) return;
    setFormError(null);
    save.mutate(previewed, {
      onSuccess: (saved) => {
        preview.reset();
        setPreviewed(undefined);
        setChosen(saved.profile);
        setSavedLabel(guidelineLabel(saved));
      },
      onError: (error) => setFormError(place(error)),
    });
  };

  const onCancel = () => {
    preview.reset();
    setPreviewed(undefined);
    setFormError(null);
  };

  const choose = (key: string) => {
    setChosen(key);
    onCancel();
    setSavedLabel(undefined);
  };

  const startFrom = (key: ProfileKey) => {
    form.reset({ customProfile: customFromProfile(profiles[key]) });
    setEditorSeq((n) => n + 1);
  };

  if (!canChoose) {
    return (
      <div className="flex flex-col gap-4">
        <p>
          This sugarbush follows <strong>{guidelineLabel(stand)}</strong>.
        </p>
        <ProfileChoices current={stand.profile} saved={savedCustom(stand)} unit={unit} />
        <GuidelineCaution />
      </div>
    );
  }

  const unchanged = chosen === stand.profile && chosen !== CUSTOM_PROFILE_KEY;
  return (
    <div className="flex flex-col gap-4">
      <ProfileChoices
        current={stand.profile}
        chosen={chosen}
        saved={savedCustom(stand)}
        unit={unit}
        onChoose={choose}
      />
      {chosen === CUSTOM_PROFILE_KEY && (
        <CustomProfileEditor key={editorSeq} form={form} unit={unit} onStartFrom={startFrom} />
      )}
      {preview.data && previewed ? (
        <GuidelinePreviewPanel
          preview={preview.data}
          unit={unit}
          saving={save.isPending}
          error={formError}
          onSave={onSave}
          onCancel={onCancel}
        />
      ) : (
        <div className="flex flex-col gap-2">
          {formError && (
            <p role="alert" className="text-alert">
              {formError}
            </p>
          )}
          <div className="flex flex-wrap items-center gap-4">
            <Button
              variant="primary"
              block
              onClick={onPreview}
              disabled={unchanged || preview.isPending}
              aria-busy={preview.isPending || undefined}
            >
              {preview.isPending ? 'Working out the change…' : `See what this changes in ${season}`}
            </Button>
            {unchanged && <p className="text-sm text-bark">This is the guideline in use.</p>}
          </div>
        </div>
      )}
      <p role="status" className="text-moss">
        {savedLabel && (
          <>
            Saved. The {season} plan now follows {savedLabel}.{' '}
            <Link
              to={paths.plan.href(stand.id, { season })}
              className="underline underline-offset-4"
            >
              Open the season plan
            </Link>
          </>
        )}
      </p>
      <GuidelineCaution />
    </div>
  );
}
