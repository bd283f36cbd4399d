import path from 'node:path';

// Objects are typed by their key's extension, so both drivers agree without keeping metadata.
const TYPES: Record<string, string> = { '.webp': 'image/webp', '.jpg': 'image/jpeg', '.png': 'image/png', '.avif': 'image/avif', '.pdf': 'application/pdf' };

export const contentTypeOfKey = (key: string) => TYPES[path.extname(key)] ?? 'application/octet-stream';
