import { sequelize } from '../db/sequelize';
import { User } from './user';
import { PasswordResetToken } from './password-reset-token';
import { EmailVerificationToken } from './email-verification-token';
import { CaughtMail } from './caught-mail';
import { Build } from './build';
import { BuildSection } from './build-section';
import { Photo } from './photo';
import { DynoRun } from './dyno-run';
import { WeighIn } from './weigh-in';
import { FigureChange } from './figure-change';
import { RetiredBuildCode } from './retired-build-code';
import { Event } from './event';
import { EventClass } from './event-class';
import { Criterion } from './criterion';
import { EventMembership } from './event-membership';
import { EventInvitation } from './event-invitation';
import { Entry } from './entry';
import { AuditLine } from './audit-line';
import { JudgeAssignment } from './judge-assignment';
import { Score } from './score';
import { SheetNote } from './sheet-note';
import { CardPrint } from './card-print';
import { Vote } from './vote';
import { ManualTieBreak } from './manual-tie-break';
import { PublishedResults } from './published-results';
import { PaymentIssue } from './payment-issue';
import { GateCheckIn } from './gate-check-in';
import { BuildLogPost } from './build-log-post';
import { BuildQuestion } from './build-question';

for (const model of [User, PasswordResetToken, EmailVerificationToken, CaughtMail, Build, BuildSection, Photo, DynoRun, WeighIn, FigureChange, RetiredBuildCode, Event, EventClass, Criterion, EventMembership, EventInvitation, Entry, AuditLine, JudgeAssignment, Score, SheetNote, CardPrint, Vote, ManualTieBreak, PublishedResults, PaymentIssue, GateCheckIn, BuildLogPost, BuildQuestion]) {
  model.initModel(sequelize);
}

User.hasMany(PasswordResetToken, { foreignKey: 'userId', onDelete: 'CASCADE' });
PasswordResetToken.belongsTo(User, { foreignKey: 'userId' });
User.hasMany(EmailVerificationToken, { foreignKey: 'userId', onDelete: 'CASCADE' });
EmailVerificationToken.belongsTo(User, { foreignKey: 'userId' });

User.hasMany(Build, { foreignKey: 'ownerId', as: 'builds', onDelete: 'CASCADE' });
Build.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' });
Build.hasMany(BuildSection, { foreignKey: 'buildId', as: 'sections', onDelete: 'CASCADE' });
BuildSection.belongsTo(Build, { foreignKey: 'buildId' });
Build.hasMany(Photo, { foreignKey: 'buildId', as: 'photos', onDelete: 'CASCADE' });
Photo.belongsTo(Build, { foreignKey: 'buildId' });
Build.hasMany(DynoRun, { foreignKey: 'buildId', as: 'dynoRuns', onDelete: 'CASCADE' });
DynoRun.belongsTo(Build, { foreignKey: 'buildId' });
Build.hasMany(WeighIn, { foreignKey: 'buildId', as: 'weighIns', onDelete: 'CASCADE' });
WeighIn.belongsTo(Build, { foreignKey: 'buildId' });
Build.hasMany(FigureChange, { foreignKey: 'buildId', as: 'figureChanges', onDelete: 'CASCADE' });
FigureChange.belongsTo(Build, { foreignKey: 'buildId' });
Build.hasMany(BuildLogPost, { foreignKey: 'buildId', as: 'logPosts', onDelete: 'CASCADE' });
BuildLogPost.belongsTo(Build, { foreignKey: 'buildId' });
Build.hasMany(BuildQuestion, { foreignKey: 'buildId', as: 'questions', onDelete: 'CASCADE' });
BuildQuestion.belongsTo(Build, { foreignKey: 'buildId' });

Event.hasMany(EventClass, { foreignKey: 'eventId', as: 'classes', onDelete: 'CASCADE' });
EventClass.belongsTo(Event, { foreignKey: 'eventId' });
Event.hasMany(Criterion, { foreignKey: 'eventId', as: 'criteria', onDelete: 'CASCADE' });
Event.hasMany(EventMembership, { foreignKey: 'eventId', as: 'memberships', onDelete: 'CASCADE' });
EventMembership.belongsTo(Event, { foreignKey: 'eventId', as: 'event' });
EventMembership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
EventInvitation.belongsTo(Event, { foreignKey: 'eventId', as: 'event' });
EventInvitation.belongsTo(User, { foreignKey: 'invitedBy', as: 'inviter' });
Entry.belongsTo(Event, { foreignKey: 'eventId', as: 'event' });
Entry.belongsTo(Build, { foreignKey: 'buildId', as: 'build' });
Entry.belongsTo(EventClass, { foreignKey: 'classId', as: 'eventClass' });
Entry.belongsTo(User, { foreignKey: 'ownerId', as: 'owner' });
AuditLine.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
CardPrint.belongsTo(User, { foreignKey: 'startedBy', as: 'starter' });
CardPrint.belongsTo(EventClass, { foreignKey: 'classId', as: 'eventClass' });

Vote.belongsTo(Entry, { foreignKey: 'entryId', as: 'entry' });

export { Event, EventClass, Criterion, EventMembership, EventInvitation, Entry, AuditLine, JudgeAssignment, Score, SheetNote, CardPrint, Vote, ManualTieBreak, PublishedResults };
export { sequelize, User, PasswordResetToken, CaughtMail, Build, BuildSection, Photo, DynoRun, WeighIn, FigureChange, RetiredBuildCode, BuildLogPost, BuildQuestion };
