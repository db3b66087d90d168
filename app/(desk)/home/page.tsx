import { redirect } from 'next/navigation';
import { requirePageUser } from '@/lib/auth/guards';
import { roleHome } from '@/lib/auth/home';

// Sign-in lands here when no page asked for it; each role goes on to its own home.
export default async function HomePage() {
  const user = await requirePageUser('/home');
  redirect(roleHome[user.role]);
}
