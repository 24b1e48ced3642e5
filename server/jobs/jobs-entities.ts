import { AttachmentRow } from '../attachments/attachment.entity';
import { OutboundEmailRow } from '../mail/outbound-email.entity';
import { CommissioningReadingRow } from '../systems/commissioning-reading.entity';
import { SystemRecordRow } from '../systems/system-record.entity';
import { SystemRevisionRow } from '../systems/system-revision.entity';
import { JobChangeRow } from './job-change.entity';
import { JobRow } from './job.entity';

/** The entities of jobs and matched-system records (migration 1764900000000-jobs). */
export const jobsEntities = [
  JobRow,
  JobChangeRow,
  SystemRecordRow,
  SystemRevisionRow,
  CommissioningReadingRow,
  AttachmentRow,
  OutboundEmailRow,
];
