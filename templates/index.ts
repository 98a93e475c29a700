/**
 * The study templates a consultant can start from (GET /api/templates lists them). Each is a
 * TipTap document with model blocks plus the assumptions those blocks link to by key.
 */
import { clinicIntakeCapacity } from './clinic-intake-capacity';
import { serviceDeskStaffing } from './service-desk-staffing';
import type { StudyTemplate } from './template-types';
import { webServiceHeadroom } from './web-service-headroom';

export type { StudyTemplate, TemplateAssumption, TemplateBlockConfig, TemplateInput, TemplateLink } from './template-types';
export { isTemplateLink } from './template-types';

export const STUDY_TEMPLATES: StudyTemplate[] = [serviceDeskStaffing, clinicIntakeCapacity, webServiceHeadroom];

export function findTemplate(key: string): StudyTemplate | undefined {
  return STUDY_TEMPLATES.find((t) => t.key === key);
}
export { relinkDocument, summarizeTemplate, templateBlocks, templateSections, type TemplateBlock } from './template-blocks';
