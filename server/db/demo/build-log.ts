import type { LogPostCreateInput } from '@shared/schemas/build-log';
import type { QuestionCreateInput } from '@shared/schemas/build-questions';

/**
 * The complete demo build's life in posts and its owner's answers. All invented: no real people,
 * shops, brands or makers. `photo` picks one of the build's photos by its position; `measurement`
 * links the dyno run or weigh-in of that date.
 */
export type DemoLogPost = Omit<LogPostCreateInput, 'photoIds' | 'dynoRunId' | 'weighInId' | 'status'> & { draft?: boolean; photos?: number[]; dynoOn?: string; weighInOn?: string };

export const DEMO_LOG_BUILD = { ownerEmail: 'owner@placard.test', title: '1967 Fastback' };

export const DEMO_LOG_POSTS: DemoLogPost[] = [
  { postedOn: '2024-06-08', title: 'It came home on a trailer', body: 'A rolling shell with a rusted floor, no engine and a box of parts nobody could name.\n\nFirst job: a *long* look underneath with a torch.' },
  { postedOn: '2024-08-17', title: 'Stripped to bare metal', body: 'Three weekends with a wire wheel and a rented blaster. The roof is good; the floor and both rear wheel tubs are not.', photos: [1] },
  { postedOn: '2024-10-26', title: 'On the jig', body: 'The shell is bolted square on the chassis jig, measured twice from the factory points.\nNothing gets cut until the diagonals agree.' },
  { postedOn: '2025-01-18', title: 'New floor and tubs', body: 'Floor pans in, rear tubs widened for the bigger tyres. Every seam welded and ground flat before the seam sealer.' },
  { postedOn: '2025-03-22', title: 'Front suspension mocked up', body: 'Coil-overs and new arms hung in place with the body at ride height. The steering rack clears the sump by a finger’s width, which is enough.' },
  { postedOn: '2025-05-10', title: 'Pushrods, and why', body: 'The rear runs its coil-overs through pushrods and bell-cranks, so the springs sit inboard and the tubs stay clear for wide tyres.\n\nThe motion ratio is worked out on the build sheet.' },
  { postedOn: '2025-07-05', title: 'Engine in the bay', body: 'The aluminium-block V8 is in on its mounts, with the supercharger an inch under the bonnet line. A tight fit, as planned.' },
  { postedOn: '2025-09-13', title: 'First fire-up', body: 'It *ran*. Forty seconds at idle, no leaks, one very loud neighbour. Oil pressure where it should be.' },
  { postedOn: '2025-10-04', title: 'First dyno day', body: 'A careful first session on the rolling road: part throttle, then a few full pulls once the fuelling was steady.', dynoOn: '2025-10-04' },
  { postedOn: '2026-02-21', title: 'Paint', body: 'Two weeks in the booth. The colour is a dark grey with a little blue in the sun.', photos: [2] },
  { postedOn: '2026-05-30', title: 'Back on the rollers', body: 'New tune, same shop. More everywhere above 4,500 rpm. The printed sheet is with the run.', dynoOn: '2026-05-30' },
  { postedOn: '2026-06-01', title: 'On the scales', body: 'Club scales, no driver, half a tank. Front-heavy, as expected, and lighter than the estimate.', weighInOn: '2026-06-01' },
  { postedOn: '2026-11-20', title: 'Winter list', body: 'Seat bolsters, a quieter exhaust for the street, and a second set of wheels for track days.', draft: true },
];

/** Answered questions, as often heard at shows (the count is the owner's own tally). */
export const DEMO_ANSWERS: QuestionCreateInput[] = [
  { question: 'What are the wheels off?', answer: 'Nothing: they are new, 18 inch, made for this kind of car. Wider at the back than at the front.', askedCount: 41 },
  { question: 'Is it drivable, or a trailer queen?', answer: 'Driven. It came to this show on its own wheels and goes home the same way.', askedCount: 33 },
  { question: 'Why the pushrods at the back?', answer: 'They move the springs inboard so the wheel tubs can take *wide* tyres. There is a post about it in the build log.', askedCount: 19 },
  { question: 'How much power does it make?', answer: 'The newest dyno run is on this page, measured at the wheels. The figure at the crank is an estimate.', askedCount: 27 },
  { question: 'How long did it take?', answer: 'Four years of evenings and weekends, most of it on the chassis.', askedCount: 12 },
  { question: 'What colour is that?', answer: 'A dark grey with a little blue in it, mixed for this car. It changes with the light.', askedCount: 15 },
];

/** One visitor question still waiting in the owner's inbox. */
export const DEMO_WAITING_QUESTION = 'Does the supercharger make it hard to start on a cold morning?';
