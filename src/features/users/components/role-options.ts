import { roles } from '../../../../shared/enums';
import { roleLabels } from '../../../config/roles';

export const roleOptions = roles.map((role) => ({ value: role, label: roleLabels[role] }));
