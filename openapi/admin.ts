// The admin API (/api/v1/admin/…): session-authenticated routes of the team console, registered on
// the shared registry under their own tag. The document builder imports this module for its side effect.
export const ADMIN_TAG = "Admin";
