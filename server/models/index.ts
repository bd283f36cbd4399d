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

for (const model of [User, PasswordResetToken, EmailVerificationToken, CaughtMail, Build, BuildSection, Photo, DynoRun, WeighIn, FigureChange, RetiredBuildCode]) model.initModel(sequelize);

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

export { sequelize, User, PasswordResetToken, CaughtMail, Build, BuildSection, Photo, DynoRun, WeighIn, FigureChange, RetiredBuildCode };
