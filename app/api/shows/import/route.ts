import { apiRoute } from '@/lib/storage/http';
import { importShowRoute } from '@/lib/storage/showRoutes';

export const runtime = 'nodejs';
export const dynamic = 'force-dynamic';

export const POST = apiRoute(importShowRoute);
