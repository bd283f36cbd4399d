import { sequelize } from '../db/sequelize';
import { User } from './user';
import { PasswordResetToken } from './password-reset-token';
import { CaughtMail } from './caught-mail';

User.initModel(sequelize);
PasswordResetToken.initModel(sequelize);
CaughtMail.initModel(sequelize);

User.hasMany(PasswordResetToken, { foreignKey: 'userId', onDelete: 'CASCADE' });
PasswordResetToken.belongsTo(User, { foreignKey: 'userId' });

export { sequelize, User, PasswordResetToken, CaughtMail };
