import { equipmentFile } from '../equipment-file.server';
import type { RequestHandler } from './$types';

export const GET: RequestHandler = (event) => equipmentFile(event, 'xlsx');
