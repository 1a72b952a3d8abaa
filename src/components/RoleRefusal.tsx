import { Link } from 'react-router-dom';
import { RULES, type Action, type Role } from '../../shared/permissions.ts';

/** What each role is for, in the words a member sees on a refusal. */
const ROLE_WORDS: Record<Role, string> = {
  owner: 'an owner runs the workshop and can do everything a designer can',
  designer: 'a designer creates, edits and forks designs',
  reviewer: 'a reviewer looks at designs, comments and approves a revision',
};

/** The roles that allow `action`, from the rule table, as words ("owner or designer"). */
function rolesAllowing(action: Action): string {
  const roles = (Object.keys(RULES) as Role[]).filter((role) => RULES[role].includes(action));
  return roles.length > 1 ? `${roles.slice(0, -1).join(', ')} or ${roles.at(-1)}` : roles[0] ?? 'no';
}

/**
 * "Your role does not allow this": shown in place of a page or panel whose action the member's
 * role lacks (read from shared/permissions.ts, the table the API enforces), naming the role, the
 * roles that would allow it and a way back.
 */
export function RoleRefusal({ role, action, doing, workshopName, back, compact = false }: {
  role: Role | null;
  action: Action;
  /** What the page does, completing "… to <doing>", e.g. "start a design". */
  doing: string;
  workshopName?: string;
  back?: { to: string; label: string };
  compact?: boolean;
}) {
  const where = workshopName ? ` of ${workshopName}` : '';
  return (
    <section role="alert" aria-labelledby="role-refusal-title" className={compact ? 'px-3 py-4 text-sm' : 'mx-auto max-w-xl px-4 py-16 text-center'}>
      {!compact && <p className="font-mono text-sm text-pencil">403</p>}
      <h1 id="role-refusal-title" className={compact ? 'font-semibold' : 'mt-2 text-2xl font-semibold'}>Your role does not allow this</h1>
      <p className={compact ? 'mt-1 text-graphite-soft' : 'mt-3 text-graphite-soft'}>
        {role ? <>You are a <span className="font-medium text-graphite">{role}</span>{where}: {ROLE_WORDS[role]}.</> : <>You are not a member{where}.</>}{' '}
        To {doing} you need the {rolesAllowing(action)} role; the workshop's owner can change it.
      </p>
      {back && <Link to={back.to} className={compact ? 'mt-2 inline-block underline underline-offset-2 hover:text-pencil' : 'btn mt-6'}>{back.label}</Link>}
    </section>
  );
}
