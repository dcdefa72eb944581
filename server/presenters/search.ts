import type {
  ChecklistSummary,
  ChecklistView,
  ChecklistItem,
  SavedSearchView,
} from '../../shared/types/catalogue';
import type { Checklist, SavedSearch } from '../models';

export function presentSavedSearch(search: SavedSearch): SavedSearchView {
  return { id: search.id, name: search.name, query: search.query };
}

export function presentChecklistSummary(checklist: Checklist): ChecklistSummary {
  return {
    id: checklist.id,
    name: checklist.name,
    printIds: checklist.printIds,
    updatedAt: checklist.updatedAt.toISOString(),
  };
}

export function presentChecklist(checklist: Checklist, items: ChecklistItem[]): ChecklistView {
  return { ...presentChecklistSummary(checklist), items };
}
