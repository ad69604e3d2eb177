/** Weeks the timeline shows at a time; the page steps by as many. */
export const TIMELINE_WEEKS = 8;
