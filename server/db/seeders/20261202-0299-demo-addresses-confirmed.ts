import type { Migration } from '../migrator';

// Every person of the demo scenario has confirmed their address, so each can register and accept
// invitations at once. Runs after the seeders that make people; the .test domain never receives mail.
export const up: Migration = async ({ context: { queryInterface: qi } }) => {
  await qi.sequelize.query('UPDATE users SET email_verified_at = now() WHERE email_verified_at IS NULL');
};
