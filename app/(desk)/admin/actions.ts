'use server';

import { revalidatePath } from 'next/cache';
import { defineAction } from '@/lib/actions/define-action';
import { inviteStaff } from '@/lib/users/invite-staff';
import { changeUserRole, setUserDisabled } from '@/lib/users/mutations';
import { staffInviteSchema, userDisableSchema, userRoleChangeSchema } from '@/lib/users/schema';

export const changeUserRoleAction = defineAction(
  { permission: 'users:manage', schema: userRoleChangeSchema, name: 'user.change_role' },
  async (input, user) => {
    const res = await changeUserRole(user, input);
    revalidatePath('/admin');
    return res;
  },
);

export const setUserDisabledAction = defineAction(
  { permission: 'users:manage', schema: userDisableSchema, name: 'user.set_disabled' },
  async (input, user) => {
    const res = await setUserDisabled(user, input);
    revalidatePath('/admin');
    return res;
  },
);

export const inviteStaffAction = defineAction(
  { permission: 'users:manage', schema: staffInviteSchema, name: 'user.invite' },
  async (input, user) => {
    await inviteStaff(user, input);
    revalidatePath('/admin');
    return { email: input.email, role: input.role };
  },
);
