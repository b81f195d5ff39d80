export {
  saveOrderUpload,
  listOrderUploads,
  findUpload,
  sniffUploadType,
  displayFilename,
  toUploadView,
  mayAttachFiles,
  inlineDisposition,
  type IncomingFile,
} from "./uploads";
export * from "./rules";
