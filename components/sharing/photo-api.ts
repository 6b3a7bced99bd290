import { api } from "@/components/plans/api";

export interface Photo {
  id: string;
  wallId: string;
  status: "pending" | "ready" | "rejected";
  widthPx: number | null;
  heightPx: number | null;
  scale: { ax: number; ay: number; bx: number; by: number; distanceMm: number } | null;
  mmPerPx: number | null;
  url: string | null;
}

/** Upload in two steps: a presigned PUT straight to storage, then the server checks and cleans the file. */
export async function uploadPhoto(planId: string, wallId: string, file: File): Promise<Photo> {
  const start = await api<{ photo: Photo; upload: { url: string; headers: Record<string, string> } }>(`/api/v1/plans/${planId}/photos`, {
    method: "POST",
    body: JSON.stringify({ wallId, contentType: file.type, bytes: file.size }),
  });
  const put = await fetch(start.upload.url, { method: "PUT", body: file, headers: start.upload.headers });
  if (!put.ok) throw new Error(`The storage refused the upload (${put.status}).`);
  return (await api<{ photo: Photo }>(`/api/v1/plans/${planId}/photos/${start.photo.id}/confirm`, { method: "POST", body: "{}" })).photo;
}

export const listPhotos = (planId: string) => api<{ photos: Photo[] }>(`/api/v1/plans/${planId}/photos`).then((r) => r.photos);
export const setScale = (planId: string, id: string, scale: Photo["scale"]) => api<{ photo: Photo }>(`/api/v1/plans/${planId}/photos/${id}`, { method: "PATCH", body: JSON.stringify({ scale }) }).then((r) => r.photo);
export const deletePhoto = (planId: string, id: string) => api(`/api/v1/plans/${planId}/photos/${id}`, { method: "DELETE" });
