import { redirect } from 'next/navigation';
import { getCurrentUser } from '@/app/_server/session';

export const dynamic = 'force-dynamic';

export default async function Home() {
  redirect((await getCurrentUser()) ? '/desk' : '/sign-in');
}
