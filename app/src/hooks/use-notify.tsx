import {
  Toast,
  ToastBody,
  ToastTitle,
  useToastController,
  type ToastIntent,
} from '@fluentui/react-components';
import { useCallback } from 'react';

/** The id of the app's one Toaster (rendered by the app provider). */
export const TOASTER_ID = 'hopwise-toaster';

/** Show a short toast: `notify('success', 'Role changed', 'ana@example.org is now analyst')`. */
export function useNotify() {
  const { dispatchToast } = useToastController(TOASTER_ID);
  return useCallback(
    (intent: ToastIntent, title: string, body?: string) =>
      dispatchToast(
        <Toast>
          <ToastTitle>{title}</ToastTitle>
          {body && <ToastBody>{body}</ToastBody>}
        </Toast>,
        { intent, politeness: intent === 'error' ? 'assertive' : 'polite' },
      ),
    [dispatchToast],
  );
}
