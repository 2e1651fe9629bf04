'use client'
/**
 * Upload a file as the raw request body with XMLHttpRequest, because fetch cannot report upload
 * progress. Resolves with the parsed JSON answer; rejects with the server's error message.
 */
export function uploadLog(url: string, file: File, onProgress: (fraction: number) => void): Promise<unknown> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest()
    xhr.open('POST', url)
    xhr.setRequestHeader('content-type', 'text/csv')
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total)
    xhr.onerror = () => reject(new Error('The connection dropped during the upload; try again'))
    xhr.onload = () => {
      let body: { error?: { message?: string } } | null = null
      try {
        body = JSON.parse(xhr.responseText)
      } catch {
        /* not JSON */
      }
      if (xhr.status >= 200 && xhr.status < 300) resolve(body)
      else reject(new Error(body?.error?.message ?? `Upload failed (${xhr.status})`))
    }
    xhr.send(file)
  })
}
