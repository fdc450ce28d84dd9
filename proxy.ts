// Sends signed-out visitors to the sign-in page (except /q/…, the customer's public quote page). It only redirects: every handler, action and
// protected layout checks the session and role itself where the data is touched.
import { withAuth } from 'next-auth/middleware';

export default withAuth({ pages: { signIn: '/sign-in' } });

export const config = {
  matcher: ['/((?!api|_next/static|_next/image|favicon.ico|icon.svg|logo.svg|fonts|sign-in|q/).*)'],
};
