import { isApiError } from './api-error';

export interface ErrorNotice {
  title: string;
  message: string;
}

/** What a page says when a request failed: a short title and the sentence that tells the person what to do. */
export function errorNotice(error: unknown): ErrorNotice {
  if (!isApiError(error)) {
    return {
      title: 'Something went wrong',
      message: 'Gelpoint hit an unexpected problem. Reload the page and try again.',
    };
  }
  if (error.status === 0) return { title: 'No connection', message: error.message };
  if (error.status === 401) return { title: 'Signed out', message: error.message };
  if (error.status === 403) return { title: "Your role can't do this", message: error.message };
  if (error.status === 404) return { title: 'Not found', message: error.message };
  if (error.status >= 500) return { title: 'The server had a problem', message: error.message };
  return { title: "That didn't work", message: error.message };
}
