/**
 * The SQL behind design cards: a design with its head revision, the head's author, its fork
 * origin (titled only when the viewer belongs to the origin's workshop), its fork count and the
 * latest reviewer decision — one query for a whole listing.
 */
import type { ApprovalState, DesignCard, RevisionInfo } from '../../../shared/schemas/designs.ts';
import type { PieceKind } from '../../../shared/engine/types.ts';

export const CARD_SELECT = `
  SELECT d.id, d.workshop_id AS "workshopId", d.title, d.kind, d.archived_at AS "archivedAt",
    d.created_at AS "createdAt", d.updated_at AS "updatedAt", d.approved_revision AS "approvedRevision",
    d.origin_design_id AS "originDesignId", d.origin_revision AS "originRevision",
    CASE WHEN om.user_id IS NULL THEN NULL ELSE o.title END AS "originTitle",
    CASE WHEN om.user_id IS NULL THEN NULL ELSE o.workshop_id END AS "originWorkshopId",
    (SELECT count(*) FROM designs f WHERE f.origin_design_id = d.id) AS "forkCount",
    r.number AS "headNumber", r.message AS "headMessage", r.engine_version AS "headEngineVersion",
    r.summary AS "headSummary", r.spec AS "headSpec", r.restored_from AS "headRestoredFrom", r.created_at AS "headCreatedAt",
    r.author_id AS "headAuthorId", au.name AS "headAuthorName", au.email AS "headAuthorEmail",
    la.revision_number AS "latestRevision", la.decision AS "latestDecision", la.created_at AS "latestAt",
    la.reviewer_id AS "latestReviewerId", la.reviewer_name AS "latestReviewerName", la.reviewer_email AS "latestReviewerEmail",
    count(*) OVER () AS "total"
  FROM designs d
  JOIN revisions r ON r.design_id = d.id AND r.number = d.head_revision
  LEFT JOIN users au ON au.id = r.author_id
  LEFT JOIN designs o ON o.id = d.origin_design_id
  LEFT JOIN memberships om ON om.workshop_id = o.workshop_id AND om.user_id = :viewerId
  LEFT JOIN LATERAL (
    SELECT a.revision_number, a.decision, a.created_at, a.reviewer_id, ru.name AS reviewer_name, ru.email AS reviewer_email
    FROM approvals a LEFT JOIN users ru ON ru.id = a.reviewer_id
    WHERE a.design_id = d.id ORDER BY a.created_at DESC, a.id DESC LIMIT 1
  ) la ON true`;

export interface CardRow {
  id: string; workshopId: string; title: string; kind: PieceKind; archivedAt: Date | null;
  createdAt: Date; updatedAt: Date; approvedRevision: number | null;
  originDesignId: string | null; originRevision: number | null; originTitle: string | null; originWorkshopId: string | null;
  forkCount: number | string;
  headNumber: number; headMessage: string; headEngineVersion: string; headSummary: Record<string, unknown>; headSpec: unknown;
  headRestoredFrom: number | null; headCreatedAt: Date;
  headAuthorId: string | null; headAuthorName: string | null; headAuthorEmail: string | null;
  latestRevision: number | null; latestDecision: 'approved' | 'changes_requested' | null; latestAt: Date | null;
  latestReviewerId: string | null; latestReviewerName: string | null; latestReviewerEmail: string | null;
  total: number | string;
}

function person(id: string | null, name: string | null, email: string | null) {
  return id ? { id, name: name ?? '', email: email ?? '' } : null;
}

export function approvalState(row: CardRow): ApprovalState {
  const latest =
    row.latestRevision !== null && row.latestDecision && row.latestAt
      ? { revision: row.latestRevision, decision: row.latestDecision, reviewer: person(row.latestReviewerId, row.latestReviewerName, row.latestReviewerEmail), at: row.latestAt.toISOString() }
      : null;
  const state =
    row.approvedRevision === row.headNumber ? 'approved'
      : latest?.revision === row.headNumber && latest.decision === 'changes_requested' ? 'changes-requested'
        : row.approvedRevision !== null ? 'approved-earlier'
          : 'pending';
  return { state, approvedRevision: row.approvedRevision, latest };
}

export function toCard(row: CardRow): DesignCard {
  const head: RevisionInfo = {
    number: row.headNumber,
    author: person(row.headAuthorId, row.headAuthorName, row.headAuthorEmail),
    message: row.headMessage,
    engineVersion: row.headEngineVersion,
    summary: row.headSummary,
    restoredFrom: row.headRestoredFrom,
    createdAt: row.headCreatedAt.toISOString(),
  };
  return {
    id: row.id,
    workshopId: row.workshopId,
    title: row.title,
    kind: row.kind,
    archived: row.archivedAt !== null,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    head,
    approval: approvalState(row),
    origin: row.originDesignId && row.originRevision !== null
      ? { designId: row.originDesignId, revisionNumber: row.originRevision, title: row.originTitle, workshopId: row.originWorkshopId }
      : null,
    forkCount: Number(row.forkCount),
  };
}

export const REVISION_SELECT = `
  SELECT r.design_id AS "designId", r.number, r.spec, r.engine_version AS "engineVersion", r.summary,
    r.message, r.restored_from AS "restoredFrom", r.created_at AS "createdAt",
    r.author_id AS "authorId", u.name AS "authorName", u.email AS "authorEmail"
  FROM revisions r LEFT JOIN users u ON u.id = r.author_id`;

export interface RevisionRowOut {
  designId: string; number: number; spec: unknown; engineVersion: string; summary: Record<string, unknown>;
  message: string; restoredFrom: number | null; createdAt: Date;
  authorId: string | null; authorName: string | null; authorEmail: string | null;
}

export function toRevisionInfo(row: RevisionRowOut): RevisionInfo {
  return {
    number: row.number,
    author: person(row.authorId, row.authorName, row.authorEmail),
    message: row.message,
    engineVersion: row.engineVersion,
    summary: row.summary,
    restoredFrom: row.restoredFrom,
    createdAt: row.createdAt.toISOString(),
  };
}
