import "server-only";
export {
  saveOrderUpload,
  listOrderUploads,
  findUpload,
  sniffUploadType,
  displayFilename,
  toUploadView,
  mayAttachFiles,
  inlineDisposition,
  attachmentDisposition,
  type IncomingFile,
} from "./uploads";
export * from "./rules";
export { assertRoomForUpload } from "./limits";
