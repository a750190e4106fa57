/** One uploaded file as a service takes it: its bytes and names, nothing of the request. */
export interface UploadedFile {
  buffer: Buffer;
  /** The type read from the bytes when the upload names allowed types; otherwise the type the sender declared. */
  mimeType: string;
  originalName: string;
}

/** A refusal's stable code and the sentence a person can act on. */
export interface UploadRefusal {
  code: string;
  message: string;
}

/** What one kind of upload accepts, and the words for each refusal (the upload middleware applies them). */
export interface UploadRules {
  /** The multipart form field that carries the one file; every refusal names it. */
  field: string;
  maxBytes: number;
  /** Text fields the form may carry besides the file. */
  maxFields: number;
  /**
   * Types accepted, read from the file's bytes (never its name or declared type); leave out when the
   * service decodes the bytes itself and says why it refuses them.
   */
  allowed?: { types: readonly string[]; refusal: UploadRefusal };
  /** 413: the file is larger than maxBytes. */
  tooLarge: UploadRefusal;
  /** 400 words. */
  words: {
    /** The issue on the field, e.g. "Choose or take a photo." */
    choose: string;
    /** The form holds a file in another field, or more than one. */
    notOneFile: string;
    /** The form could not be read to its end. */
    unreadable: string;
    /** No file came, or an empty one. */
    missing: string;
  };
}
