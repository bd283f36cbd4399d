import { Router } from 'express';

export const publicApiRouter = Router();
