import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { noteCategories, noteCategoryLabels, type NoteCategory } from '@shared/schemas/enums';
import { FOLLOW_UP_DUE_DAYS } from '@shared/schemas/note';
import { cn } from '@/components/ui/cn';
import { Field, controlClass } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { isApiError } from '@/lib/api-client';
import { applyServerErrors } from '@/lib/form-errors';
import { useCreateNote } from '../api/create-note';
import type { NoteOwner } from '../api/note-keys';
import {
  noteFields,
  noteFormSchema,
  type NoteFormOutput,
  type NoteFormValues,
} from './note-form-values';
import { PhotoInput } from './photo-input';

function messageFor(error: unknown): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  if (error.status === 403) return 'Your role in this sugarbush does not write notes.';
  if (error.status === 404) return 'This tree or stand is no longer there for you.';
  return error.message;
}

const photoMessage = (error: unknown) =>
  isApiError(error) ? error.message : 'The photo could not be sent.';

/** Write a note (category, text, an optional follow-up date and photo) on a tree or the stand. */
export function NoteForm({
  owner,
  title,
  defaultCategory,
}: {
  owner: NoteOwner;
  title: string;
  defaultCategory: NoteCategory;
}) {
  const headingId = useId();
  const photoId = useId();
  const defaults: NoteFormValues = { category: defaultCategory, body: '', followUpOn: '' };
  const form = useForm<NoteFormValues, unknown, NoteFormOutput>({
    resolver: zodResolver(noteFormSchema),
    defaultValues: defaults,
  });
  const { errors } = form.formState;
  const [photo, setPhoto] = useState<File | null>(null);
  // A new key empties the file input after a save.
  const [photoKey, setPhotoKey] = useState(0);
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string>();
  const create = useCreateNote(owner);

  const onSubmit = form.handleSubmit((input) => {
    setFormError(null);
    setNotice(undefined);
    create.mutate(
      { ...input, photo },
      {
        onSuccess: (result) => {
          form.reset({ ...defaults, category: input.category });
          setPhoto(null);
          setPhotoKey((k) => k + 1);
          if (result.photoError)
            setFormError(
              `The note is saved, but not its photo: ${photoMessage(result.photoError)}`,
            );
          else setNotice(result.photo ? 'Note and photo saved.' : 'Note saved.');
        },
        onError: (error) =>
          setFormError(applyServerErrors(error, form.setError, noteFields, messageFor)),
      },
    );
  });

  return (
    <section aria-labelledby={headingId} className="rounded border border-rule p-4">
      <h2 id={headingId} className="text-lg font-bold">
        {title}
      </h2>
      <form
        noValidate
        onSubmit={onSubmit}
        onChange={() => setNotice(undefined)}
        className="mt-3 flex flex-col gap-4"
      >
        <Field label="Category" error={errors.category?.message} className="max-w-xs">
          {(control) => (
            <select {...control} {...form.register('category')} className={controlClass}>
              {noteCategories.map((c) => (
                <option key={c} value={c}>
                  {noteCategoryLabels[c]}
                </option>
              ))}
            </select>
          )}
        </Field>
        <Field label="Note" error={errors.body?.message}>
          {(control) => (
            <textarea
              {...control}
              {...form.register('body')}
              rows={4}
              maxLength={5000}
              className={cn(controlClass, 'py-2')}
            />
          )}
        </Field>
        <Field
          label="Follow up by"
          error={errors.followUpOn?.message}
          hint={`Optional. It shows as due ${FOLLOW_UP_DUE_DAYS} days ahead.`}
          className="max-w-xs"
        >
          {(control) => (
            <input
              {...control}
              {...form.register('followUpOn')}
              type="date"
              className={controlClass}
            />
          )}
        </Field>
        <div className="flex flex-col gap-1">
          <label htmlFor={photoId} className="text-sm font-bold">
            Photo
          </label>
          <PhotoInput
            key={photoKey}
            id={photoId}
            onChange={setPhoto}
            describedBy={`${photoId}-hint`}
          />
          <p id={`${photoId}-hint`} className="text-sm text-bark">
            Optional. JPEG, PNG or WebP; its location and camera details are removed.
          </p>
        </div>
        <FormFooter
          error={formError}
          pending={create.isPending}
          label="Save note"
          notice={notice}
        />
      </form>
    </section>
  );
}
