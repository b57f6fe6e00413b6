import { getTranslations } from 'next-intl/server';
import { renderMsg, type Msg } from '@/lib/outlook/view-model';

/** A server-side renderer for the view-model's messages in the request's locale. */
export async function getMsgText(): Promise<(msg: Msg | string) => string> {
  const t = await getTranslations();
  const translate = (key: string, values?: Record<string, string | number | Date>) => t(key as never, values as never);
  return (msg) => (typeof msg === 'string' ? msg : renderMsg(translate, msg));
}
