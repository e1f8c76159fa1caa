import type * as ToolkitApi from '../../../../../shared/api/toolkit';
import type { Json } from '../../../../../shared/api/json';

/** The toolkit answers as the client receives them (dates as ISO strings); shared/api/toolkit defines them. */
export type KnowledgeEntry = Json<ToolkitApi.KnowledgeEntry>;
export type SalvagePart = Json<ToolkitApi.SalvagePart>;
export type Substitute = Json<ToolkitApi.Substitute>;
export type KnowledgeSharing = Json<ToolkitApi.KnowledgeSharing>;
