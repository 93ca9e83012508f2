/**
 * The one permission matrix. Route handlers and server actions ask `can()` on the server;
 * the UI asks the same function to hide what a role may not do.
 *
 * A user has an organisation-wide role; inside a project, the member's project role
 * decides. Admins manage people and projects but do not run or sign off analyses.
 */
export const ROLES = ["admin", "engineer", "reviewer", "designer"] as const;
export type Role = (typeof ROLES)[number];
export const PROJECT_ROLES = ["engineer", "reviewer", "designer"] as const;
export type ProjectRole = (typeof PROJECT_ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Administrator",
  engineer: "Engineer",
  reviewer: "Reviewer",
  designer: "Designer",
};

const matrix = {
  // organisation-wide
  "users.manage": ["admin"],
  "projects.create": ["admin"],
  "mail.view": ["admin"],
  // inside a project (admins see every project of their organisation)
  "project.view": ["admin", "engineer", "reviewer", "designer"],
  "members.manage": ["admin"],
  "settings.edit": ["admin", "reviewer"],
  "section.edit": ["engineer", "designer"],
  "material.edit": ["engineer", "designer"],
  "document.upload": ["engineer", "designer", "reviewer"],
  "run.create": ["engineer", "designer"],
  "run.submit": ["engineer", "designer"],
  "run.review": ["reviewer"],
  "run.comment": ["engineer", "designer", "reviewer"],
  "design.sweep": ["designer", "engineer"],
} as const satisfies Record<string, readonly Role[]>;

export type Action = keyof typeof matrix;
export const ACTIONS = Object.keys(matrix) as Action[];

/** Whether `role` may take `action`. `role` is the project role inside a project, the global role outside. */
export function can(role: Role | null | undefined, action: Action): boolean {
  if (!role) return false;
  return (matrix[action] as readonly Role[]).includes(role);
}

/** The role that counts inside a project: admins keep theirs; others need a membership. */
export function effectiveProjectRole(globalRole: Role, memberRole: ProjectRole | null): Role | null {
  if (globalRole === "admin") return "admin";
  return memberRole;
}
