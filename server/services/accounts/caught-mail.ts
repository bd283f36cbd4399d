import { CaughtMail } from '../../models/caught-mail';

export const listCaughtMail = (limit = 200) => CaughtMail.findAll({ order: [['createdAt', 'DESC'], ['id', 'DESC']], limit });
export const getCaughtMail = (id: number) => CaughtMail.findByPk(id);
