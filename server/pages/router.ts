import { Router } from 'express';

/** Server-rendered public pages (/c/<code>). */
export const pagesRouter = Router();
