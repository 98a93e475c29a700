import { eq, inArray } from 'drizzle-orm';
import { ENGINE_VERSION } from '../../../shared/queue/index';
import type { SessionUser } from '../../../shared/schemas/auth';
import type { FrozenAssumption, RevisionSnapshot } from '../../../shared/schemas/revisions';
import { assumptions, users } from '../../db/schema/index';
import type { EngagementRow } from '../engagements/engagement-access';
import { readStudyBlockResults, type Tx } from '../studies/block-rows';
import type { StudyRow } from '../studies/study-access';

/**
 * Freezes a study as revision `number`: its document, the server's stored result of every block,
 * the assumptions those blocks link (with their current values) and the engine version. Run inside
 * the submit transaction after the study row is locked, so all of it belongs to one saved version.
 * The result goes through JSON once, so the hash taken now equals the hash of what is read back.
 */
export async function buildSnapshot(tx: Tx, study: StudyRow, engagement: EngagementRow, number: number, by: SessionUser, at: Date): Promise<RevisionSnapshot> {
  const blocks = await readStudyBlockResults(tx, study.id);
  const ids = [...new Set(blocks.flatMap((b) => b.assumptionIds))];
  const rows = ids.length
    ? await tx
        .select({ a: assumptions, ownerName: users.name })
        .from(assumptions)
        .leftJoin(users, eq(users.id, assumptions.ownerId))
        .where(inArray(assumptions.id, ids))
        .orderBy(assumptions.name)
    : [];
  const frozen: FrozenAssumption[] = rows.map(({ a, ownerName }) => ({
    id: a.id,
    name: a.name,
    value: a.value,
    unit: a.unit,
    sourceKind: a.sourceKind,
    sourceDetail: a.sourceDetail,
    ownerName,
    notes: a.notes,
  }));
  const snapshot: RevisionSnapshot = {
    engagement: { id: engagement.id, name: engagement.name, clientName: engagement.clientName, safetyCritical: engagement.safetyCritical },
    study: { id: study.id, title: study.title },
    number,
    submittedAt: at.toISOString(),
    submittedBy: by.name,
    document: study.document as RevisionSnapshot['document'],
    blocks: Object.fromEntries(blocks.map((b) => [b.blockId, b])),
    assumptions: frozen,
    // Normally one version; blocks computed by different engine versions are all named, not hidden.
    engineVersion: [...new Set(blocks.map((b) => b.engineVersion))].sort().join(', ') || ENGINE_VERSION,
  };
  return JSON.parse(JSON.stringify(snapshot)) as RevisionSnapshot;
}
