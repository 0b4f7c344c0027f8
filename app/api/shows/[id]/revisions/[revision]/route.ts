import { apiRoute } from '@/lib/storage/http';
import { getRevisionRoute } from '@/lib/storage/showRoutes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = apiRoute<{ id: string; revision: string }>(getRevisionRoute);
