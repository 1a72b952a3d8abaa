/** The Web Worker that runs fit to the niche off the page's thread (see nicheFit.ts). */
import { answerNicheFit, type NicheFitRequest } from './nicheFit.ts';

self.onmessage = (event: MessageEvent<NicheFitRequest>) => {
  self.postMessage(answerNicheFit(event.data));
};
