import { config } from '../core/config';
import { logger } from '../core/logger';
import { mailRepository } from './mail.repository';
import { retrainingMail, type RetrainingFacts } from './mail-templates';
import { deliver } from './mailer';

/** After the request has committed. Answers whether a mail went out (the person may have opted out). */
export async function notifyRetrainRequested(
  userId: number,
  facts: Omit<RetrainingFacts, 'personName' | 'url'> & { procedureVersionId: number },
): Promise<boolean> {
  try {
    const [person] = await mailRepository.recipients('retraining', [], userId);
    if (!person) return false;
    const content = retrainingMail({
      ...facts,
      personName: person.displayName,
      url: `${config().publicUrl}/procedures/versions/${facts.procedureVersionId}`,
    });
    const result = await deliver('retraining', [person], content);
    return result.sent === 1;
  } catch (err) {
    logger.error({ err, userId }, 'retraining mail failed');
    return false;
  }
}
