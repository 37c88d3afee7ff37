// Multipart uploads (multer, in memory): one file of at most 20 MB. The parser, not the file
// name, decides what the content is.
import type { Request, Response } from 'express';
import multer from 'multer';
import { AppError, badRequest } from './errors';

export const maxUploadBytes = 20 * 1024 * 1024;

const receiver = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxUploadBytes, files: 1, fields: 10 } }).single('file');

export function receiveFile(req: Request, res: Response): Promise<{ bytes: Buffer; fileName: string; contentType: string }> {
  return new Promise((resolve, reject) => {
    receiver(req, res, (error: unknown) => {
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') return reject(new AppError('too_large', 'The file is larger than 20 MB.', 413));
        return reject(badRequest(`The upload could not be read (${error.message}).`));
      }
      if (error) return reject(badRequest('The upload could not be read; send it as multipart/form-data with a "file" field.'));
      if (!req.file) return reject(badRequest('No file was sent; attach it in a "file" field.', { file: 'Choose a file.' }));
      // Browsers send names as latin1 bytes of UTF-8; restore accented names.
      const fileName = Buffer.from(req.file.originalname, 'latin1').toString('utf8').slice(0, 255);
      resolve({ bytes: req.file.buffer, fileName, contentType: req.file.mimetype || 'application/octet-stream' });
    });
  });
}
