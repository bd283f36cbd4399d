import { Router, type Request, type Response } from 'express';
import { QuestionCreateSchema, QuestionSameAsSchema, QuestionUpdateSchema } from '@shared/schemas/build-questions';
import { IdParamSchema, IdSchema } from '@shared/schemas/params';
import { parseBody, parseParams } from '../middlewares/validate';
import { currentUser, requireUser } from '../middlewares/authenticate';
import { authorizeBuild } from '../policies/build';
import { findBuild } from '../services/builds/builds';
import { createAnsweredQuestion, deleteQuestion, listAnsweredQuestions, listWaitingQuestions, markSameAs, updateQuestion } from '../services/builds/build-questions';
import { presentOwnQuestions } from '../presenters/build-log';

/** The owner's questions: those answered (on the public page) and the visitors' inbox. */
export const buildQuestionsRouter = Router();
buildQuestionsRouter.use('/builds', requireUser);

const QuestionParams = IdParamSchema.extend({ questionId: IdSchema });

async function buildFor(req: Request, id: number, action: 'view' | 'edit') {
  const build = await findBuild(id);
  authorizeBuild(currentUser(req), action, build);
  return build;
}

/** Every change answers with both lists, so the editor shows the inbox and the answers as they now are. */
async function respondWithQuestions(res: Response, buildId: number, status = 200) {
  const [answered, waiting] = await Promise.all([listAnsweredQuestions(buildId), listWaitingQuestions(buildId)]);
  res.status(status).json({ questions: presentOwnQuestions(answered, waiting) });
}

buildQuestionsRouter.get('/builds/:id/questions', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const build = await buildFor(req, id, 'view');
  await respondWithQuestions(res, build.id);
});

buildQuestionsRouter.post('/builds/:id/questions', async (req, res) => {
  const { id } = parseParams(req, IdParamSchema);
  const input = parseBody(req, QuestionCreateSchema);
  const build = await buildFor(req, id, 'edit');
  await createAnsweredQuestion(build, input);
  await respondWithQuestions(res, build.id, 201);
});

buildQuestionsRouter.patch('/builds/:id/questions/:questionId', async (req, res) => {
  const { id, questionId } = parseParams(req, QuestionParams);
  const input = parseBody(req, QuestionUpdateSchema);
  const build = await buildFor(req, id, 'edit');
  await updateQuestion(build, questionId, input);
  await respondWithQuestions(res, build.id);
});

buildQuestionsRouter.post('/builds/:id/questions/:questionId/same-as', async (req, res) => {
  const { id, questionId } = parseParams(req, QuestionParams);
  const { answeredId } = parseBody(req, QuestionSameAsSchema);
  const build = await buildFor(req, id, 'edit');
  await markSameAs(build, questionId, answeredId);
  await respondWithQuestions(res, build.id);
});

buildQuestionsRouter.delete('/builds/:id/questions/:questionId', async (req, res) => {
  const { id, questionId } = parseParams(req, QuestionParams);
  const build = await buildFor(req, id, 'edit');
  await deleteQuestion(build, questionId);
  await respondWithQuestions(res, build.id);
});
