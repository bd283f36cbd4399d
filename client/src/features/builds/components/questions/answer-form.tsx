import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { QuestionCreateSchema, type OwnQuestion, type QuestionCreateInput } from '@shared/schemas/build-questions';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { TextField } from '@client/components/ui/text-field';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { useCreateQuestion } from '../../api/create-question';
import { useUpdateQuestion } from '../../api/update-question';
import { placeServerErrors } from '../editor/form-values';
import { errorAt } from '../editor/fields';

const FIELDS = ['question', 'answer', 'askedCount'];

/**
 * One form for a question and its answer: a new one the owner writes, a visitor's waiting one
 * (answering it puts it on the page) or an answered one being edited.
 */
export function AnswerForm({ buildId, question, label, submitLabel, onDone }: { buildId: number; question: OwnQuestion | null; label: string; submitLabel: string; onDone?: () => void }) {
  const create = useCreateQuestion(buildId);
  const update = useUpdateQuestion(buildId);
  const [formError, setFormError] = useState('');
  const { register, handleSubmit, setError, reset, formState: { errors } } = useForm<QuestionCreateInput>({
    resolver: zodResolver(QuestionCreateSchema) as never,
    defaultValues: { question: question?.question ?? '', answer: question?.answer ?? '', askedCount: question?.askedCount ?? 1 },
  });
  const onSubmit = handleSubmit((input) => {
    setFormError('');
    const done = {
      onSuccess: () => {
        if (!question) reset();
        onDone?.();
      },
      onError: (err: Error) => setFormError(placeServerErrors(err, setError, FIELDS)),
    };
    if (question) update.mutate({ questionId: question.id, input }, done);
    else create.mutate(input, done);
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label={label} className="flex flex-col gap-3">
      {formError ? <Notice tone="danger">{formError}</Notice> : null}
      <TextAreaField label="Question" rows={2} {...register('question')} error={errorAt(errors, 'question')} />
      <TextAreaField label="Answer" rows={4} {...register('answer')} error={errorAt(errors, 'answer')} hint="A blank line starts a new paragraph; *stars* set words in italics." />
      <TextField
        label="Times asked"
        inputMode="numeric"
        className="max-w-40"
        {...register('askedCount', { valueAsNumber: true })}
        error={errorAt(errors, 'askedCount')}
        hint="The most asked come first on the page."
      />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={create.isPending || update.isPending}>
          {submitLabel}
        </Button>
        {onDone ? (
          <Button type="button" variant="quiet" onClick={onDone}>
            Cancel
          </Button>
        ) : null}
      </div>
    </form>
  );
}
