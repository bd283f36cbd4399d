import { Router } from 'express';

export const cardsRouter = Router();
