import { useState } from 'react';
import type { OwnQuestion } from '@shared/schemas/build-questions';
import { formatDateTime } from '@shared/words';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { SelectField } from '@client/components/ui/select-field';
import { useDeleteQuestion } from '../../api/delete-question';
import { useMarkQuestionSameAs } from '../../api/mark-question-same-as';
import { AnswerForm } from './answer-form';

/** A visitor's question in the inbox: answer it, count it under an answer already given, or discard it. */
export function WaitingQuestion({ buildId, question, answered }: { buildId: number; question: OwnQuestion; answered: OwnQuestion[] }) {
  const [answering, setAnswering] = useState(false);
  const [sameAs, setSameAs] = useState('');
  const [error, setError] = useState('');
  const merge = useMarkQuestionSameAs(buildId);
  const discard = useDeleteQuestion(buildId);
  return (
    <li className="flex flex-col gap-3 border border-ink p-3">
      <p className="text-sm text-graphite">Asked {formatDateTime(question.askedAt)} by a visitor</p>
      <p className="font-semibold whitespace-pre-line">{question.question}</p>
      {error ? <Notice tone="danger">{error}</Notice> : null}
      {answering ? (
        <AnswerForm buildId={buildId} question={{ ...question, askedCount: 1 }} label={`Answer: ${question.question}`} submitLabel="Publish the answer" onDone={() => setAnswering(false)} />
      ) : (
        <div className="flex flex-wrap gap-2">
          <Button type="button" onClick={() => setAnswering(true)} aria-label={`Answer: ${question.question}`}>
            Answer
          </Button>
          <Button type="button" variant="quiet" busy={discard.isPending} onClick={() => discard.mutate(question.id, { onError: (err) => setError(err.message) })} aria-label={`Discard: ${question.question}`}>
            Discard
          </Button>
        </div>
      )}
      {answered.length && !answering ? (
        <div className="flex flex-col gap-2 sm:flex-row sm:items-end">
          <SelectField label="Or it is already answered as" placeholder="Choose an answered question" options={answered.map((a) => ({ value: String(a.id), label: a.question }))} value={sameAs} onChange={(e) => setSameAs(e.target.value)} className="min-w-0 sm:flex-1" />
          <Button
            type="button"
            variant="secondary"
            disabled={!sameAs}
            busy={merge.isPending}
            onClick={() => merge.mutate({ questionId: question.id, answeredId: Number(sameAs) }, { onError: (err) => setError(err.message) })}
          >
            Count it there
          </Button>
        </div>
      ) : null}
    </li>
  );
}
