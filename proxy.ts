// Redirects only: a page that needs a session sends a signed-out visitor to the sign-in page.
// Who may see what is decided by lib/server/access.ts on every page and route.
import { withAuth } from "next-auth/middleware";

export default withAuth({ pages: { signIn: "/sign-in" } });

export const config = { matcher: ["/studio/:path*", "/me/:path*"] };
