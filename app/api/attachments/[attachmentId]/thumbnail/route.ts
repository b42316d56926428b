import { handle } from '@/app/_server/http';
import { attachmentResponse } from '../image-response';

export const GET = handle<{ attachmentId: string }>(async (_request, { params }) => attachmentResponse(params.attachmentId, 'thumbnail'));
