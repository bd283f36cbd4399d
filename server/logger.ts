import { pino } from 'pino';
import { config } from './config';

export const logger = pino({
  level: config.logLevel,
  // Never write credentials or cookies to the log.
  redact: ['req.headers.cookie', 'req.headers.authorization', 'req.headers["x-csrf-token"]', 'res.headers["set-cookie"]', '*.password', '*.newPassword', '*.currentPassword'],
});
