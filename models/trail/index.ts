// The isomorphic trail: safe in the browser and in Node. The synchronous
// node:crypto path (hashEvent, sealEvent, verifyChain) is in ./node-hash.
export { TRAIL_ACTIONS, isTrailAction, type TrailAction } from "./actions";
export {
  GENESIS_HASH,
  eventBody,
  hashInput,
  trailEventSchema,
  type TrailEvent,
  type TrailEventBody,
} from "./event";
export {
  RECORD_FORMAT,
  RECORD_FORMAT_ID,
  buildRecord,
  parseRecord,
  parseRecordText,
  recordOptions,
  trailRecordSchema,
  verifyRecordAsync,
  type ParseRecordResult,
  type RecordErrors,
  type TrailRecord,
} from "./record";
export { EMPTY_HEAD, formatHead, parseHead, type ParseHeadResult, type TrailHead } from "./head";
export type { ChainFailureReason, HeadCheck, VerifyOptions, VerifyResult } from "./verify-core";
export {
  WebCryptoUnavailableError,
  hashEventAsync,
  sealEventAsync,
  sha256HexAsync,
  verifyChainAsync,
} from "./web-hash";
