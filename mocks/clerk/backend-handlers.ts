import { http, HttpResponse } from 'msw';

/** A user as the Clerk backend API returns it (only the fields Dutywise reads). */
export type FakeClerkUser = { id: string; email: string; firstName: string; lastName: string; role?: string };

/** msw handlers for the Clerk backend endpoints the SDK calls when Dutywise maps a new user. */
export function clerkBackendHandlers(users: FakeClerkUser[]) {
  return [
    http.get('*/v1/users/:userId', ({ params }) => {
      const u = users.find((x) => x.id === params.userId);
      if (!u)
        return HttpResponse.json({ errors: [{ code: 'resource_not_found', message: 'not found' }] }, { status: 404 });
      const emailId = `idn_${u.id}`;
      return HttpResponse.json({
        object: 'user',
        id: u.id,
        first_name: u.firstName,
        last_name: u.lastName,
        primary_email_address_id: emailId,
        email_addresses: [
          {
            id: emailId,
            object: 'email_address',
            email_address: u.email,
            verification: { status: 'verified', strategy: 'email_code' },
            linked_to: [],
          },
        ],
        phone_numbers: [],
        web3_wallets: [],
        external_accounts: [],
        public_metadata: u.role ? { role: u.role } : {},
        private_metadata: {},
        unsafe_metadata: {},
        created_at: 1_700_000_000_000,
        updated_at: 1_700_000_000_000,
      });
    }),
  ];
}
