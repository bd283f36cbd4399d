import { useState } from 'react';
import type { OwnerBuild } from '@shared/schemas/build';
import type { OwnQuestion } from '@shared/schemas/build-questions';
import { countOf } from '@shared/words';
import { Button } from '@client/components/ui/button';
import { Notice } from '@client/components/ui/notice';
import { LightText } from '@client/components/ui/light-text';
import { ErrorState, LoadingState } from '@client/components/ui/states';
import { useQuestions } from '../../api/list-questions';
import { useDeleteQuestion } from '../../api/delete-question';
import { EditorSection } from '../editor/section-form';
import { AnswerForm } from './answer-form';
import { WaitingQuestion } from './waiting-question';

function AnsweredQuestion({ buildId, question }: { buildId: number; question: OwnQuestion }) {
  const [editing, setEditing] = useState(false);
  const [error, setError] = useState('');
  const remove = useDeleteQuestion(buildId);
  if (editing) {
    return (
      <li className="border border-ink p-3">
        <AnswerForm buildId={buildId} question={question} label={`Edit: ${question.question}`} submitLabel="Save" onDone={() => setEditing(false)} />
      </li>
    );
  }
  return (
    <li className="border border-rule p-3">
      <p className="font-semibold whitespace-pre-line">{question.question}</p>
      <LightText text={question.answer ?? ''} className="text-sm" />
      <p className="text-sm text-graphite">Asked {countOf(question.askedCount, 'time')}</p>
      {error ? <Notice tone="danger">{error}</Notice> : null}
      <div className="mt-2 flex flex-wrap gap-2">
        <Button type="button" variant="secondary" onClick={() => setEditing(true)} aria-label={`Edit: ${question.question}`}>
          Edit
        </Button>
        <Button type="button" variant="quiet" busy={remove.isPending} onClick={() => remove.mutate(question.id, { onError: (err) => setError(err.message) })} aria-label={`Take off the page: ${question.question}`}>
          Take off the page
        </Button>
      </div>
    </li>
  );
}

/** Questions people ask: the visitors' inbox first, then the answers the page shows, most asked first. */
export function QuestionsPanel({ build }: { build: OwnerBuild }) {
  const questions = useQuestions(build.id);
  const [adding, setAdding] = useState(false);
  const waiting = questions.data?.questions.waiting ?? [];
  const answered = questions.data?.questions.answered ?? [];
  return (
    <EditorSection id="questions" title={waiting.length ? `Questions (${waiting.length} waiting)` : 'Questions'}>
      <div className="flex flex-col gap-5">
        {questions.isPending ? <LoadingState label="Loading the questions…" /> : questions.error ? <ErrorState error={questions.error} onRetry={() => void questions.refetch()} /> : null}
        <div className="flex flex-col gap-2">
          <h3 className="font-display uppercase">Waiting for your answer</h3>
          {waiting.length ? (
            <ul className="flex flex-col gap-3">
              {waiting.map((q) => (
                <WaitingQuestion key={q.id} buildId={build.id} question={q} answered={answered} />
              ))}
            </ul>
          ) : (
            <p className="text-sm text-graphite">No questions waiting. Visitors ask from the build page; nothing about them is kept but the question.</p>
          )}
        </div>
        <div className="flex flex-col gap-2">
          <h3 className="font-display uppercase">On the build page ({countOf(answered.length, 'answer')})</h3>
          <ul className="flex flex-col gap-3">
            {answered.map((q) => (
              <AnsweredQuestion key={q.id} buildId={build.id} question={q} />
            ))}
          </ul>
          {adding ? (
            <div className="border border-ink p-3">
              <AnswerForm buildId={build.id} question={null} label="Add a question people ask" submitLabel="Add the answer" onDone={() => setAdding(false)} />
            </div>
          ) : (
            <div>
              <Button type="button" variant="secondary" onClick={() => setAdding(true)}>
                Add a question people ask
              </Button>
            </div>
          )}
        </div>
      </div>
    </EditorSection>
  );
}
