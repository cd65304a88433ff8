/**
 * Use case: add a photo to a survey (and its room or defect). The file is downscaled and
 * stripped of location data first, then stored in one short transaction — never the camera's
 * original, and never work other than IndexedDB inside the transaction.
 */
import type { Photo } from '../model/photo.ts';
import { savePhoto } from '../store/photos.ts';
import { connection } from './storage-connection.ts';
import { downscalePhoto } from './downscale-photo.ts';

export interface PhotoPlace {
  surveyId: string;
  roomId?: string;
  defectId?: string;
  caption: string;
}

export async function addPhoto(file: Blob, place: PhotoPlace, now: Date = new Date()): Promise<Photo> {
  const { bytes, width, height } = await downscalePhoto(file);
  const { surveyId, ...where } = place;
  const photo: Photo = { id: crypto.randomUUID(), ...where, takenAt: now.toISOString(), width_px: width, height_px: height };
  return savePhoto(connection, surveyId, photo, bytes);
}
