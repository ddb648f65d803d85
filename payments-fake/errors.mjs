// Errors in the payments API's JSON error shape, so the official SDK raises
// the same error classes it would against the real service.

export class ApiError extends Error {
  /**
   * @param {number} status HTTP status
   * @param {string} message shown to the developer
   * @param {{ type?: string, param?: string, code?: string }} [details]
   */
  constructor(status, message, { type = "invalid_request_error", param, code } = {}) {
    super(message);
    this.status = status;
    this.type = type;
    this.param = param;
    this.code = code;
  }

  toBody() {
    return {
      error: {
        type: this.type,
        message: this.message,
        ...(this.code ? { code: this.code } : {}),
        ...(this.param ? { param: this.param } : {}),
      },
    };
  }
}

export const invalid = (message, param, code) => new ApiError(400, message, { param, code });

export const missing = (kind, id, param = "id") => new ApiError(404, `No such ${kind}: '${id}'`, { param, code: "resource_missing" });
