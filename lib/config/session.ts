/** How often the session page and the studio screen ask for the session (docs/api.md, "Live updates"). */
export const SESSION_POLL_MS = 750;
