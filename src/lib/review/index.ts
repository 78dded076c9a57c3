export { firstLightChecklist, checklistFamily, type Checklist, type ChecklistItem, type ChecklistFamily } from './checklist';
export { reviewStatus, type ReviewStatus, type ReviewStatusKind } from './status';
