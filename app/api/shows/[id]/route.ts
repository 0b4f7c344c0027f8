import { apiRoute } from '@/lib/storage/http';
import { binShowRoute, getShowRoute, saveShowRoute } from '@/lib/storage/showRoutes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const GET = apiRoute<{ id: string }>(getShowRoute);
export const PUT = apiRoute<{ id: string }>(saveShowRoute);
export const DELETE = apiRoute<{ id: string }>(binShowRoute);
