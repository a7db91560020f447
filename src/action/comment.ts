// The pull request comment: one per policy, found again by its hidden marker and
// edited in place, so a PR carries one up-to-date verdict rather than a thread of
// them. Takes plain values; a failure is returned, never thrown, since a comment
// that cannot be posted (a fork's read-only token) must not change the verdict.
import { getOctokit } from '@actions/github';

/** Comments listed per page: GitHub's maximum. */
const PER_PAGE = 100;

export interface CommentTarget {
  apiUrl: string;
  token: string;
  owner: string;
  repo: string;
  /** The pull request's number (its issue number). */
  issue: number;
}

export type CommentOutcome =
  | { action: 'created' | 'updated'; url: string }
  | { action: 'unchanged'; url: string }
  | { action: 'not-needed' }
  | { action: 'failed'; status: number | null; message: string };

interface ListedComment {
  id: number;
  body?: string | null;
  html_url: string;
  user?: { type?: string } | null;
}

function failure(err: unknown): CommentOutcome {
  const e = err as { status?: unknown; message?: unknown };
  return { action: 'failed', status: typeof e.status === 'number' ? e.status : null, message: typeof e.message === 'string' ? e.message : String(err) };
}

/** Returns what was done with the policy's comment: edited when one with the marker exists and its body differs, created when none exists and `create` is true. */
export async function upsertComment(target: CommentTarget, marker: string, body: string, create: boolean): Promise<CommentOutcome> {
  const octokit = getOctokit(target.token, { baseUrl: target.apiUrl });
  const where = { owner: target.owner, repo: target.repo, issue_number: target.issue };
  let existing: ListedComment | undefined;
  try {
    const comments = (await octokit.paginate(octokit.rest.issues.listComments, { ...where, per_page: PER_PAGE })) as ListedComment[];
    // Anyone can paste the marker into a comment: prefer one a bot wrote, and only ones that start with it.
    const marked = comments.filter((c) => (c.body ?? '').startsWith(marker));
    existing = marked.find((c) => c.user?.type === 'Bot') ?? marked[0];
  } catch (err) {
    return failure(err);
  }
  try {
    if (existing) {
      if (existing.body === body) return { action: 'unchanged', url: existing.html_url };
      const res = await octokit.rest.issues.updateComment({ owner: target.owner, repo: target.repo, comment_id: existing.id, body });
      return { action: 'updated', url: res.data.html_url };
    }
    if (!create) return { action: 'not-needed' };
    const res = await octokit.rest.issues.createComment({ ...where, body });
    return { action: 'created', url: res.data.html_url };
  } catch (err) {
    return failure(err);
  }
}
