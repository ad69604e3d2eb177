import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Booking, BookingFeedLink, BookingFeedLinkStatus, BOOKINGS_PATH, CreateBookingRequest, MoveBookingRequest } from '@shared/bookings';
import { BATCHES_PATH, BatchSummary } from '@shared/batches';
import { KIT_PATH, KitItem, KitItemInput, KitItemSummary, MaintenanceEntry, MaintenanceEntryInput } from '@shared/kit';
import { Observable } from 'rxjs';

/** Typed calls to /api/kit and /api/bookings. */
@Injectable({ providedIn: 'root' })
export class KitRoomClient {
  private readonly http = inject(HttpClient);

  items(): Observable<KitItemSummary[]> {
    return this.http.get<KitItemSummary[]>(KIT_PATH);
  }

  createItem(input: KitItemInput): Observable<KitItem> {
    return this.http.post<KitItem>(KIT_PATH, input);
  }

  updateItem(kitItemId: number, changes: Partial<KitItemInput>): Observable<KitItem> {
    return this.http.patch<KitItem>(`${KIT_PATH}/${kitItemId}`, changes);
  }

  maintenanceLog(kitItemId: number): Observable<MaintenanceEntry[]> {
    return this.http.get<MaintenanceEntry[]>(`${KIT_PATH}/${kitItemId}/maintenance`);
  }

  recordMaintenance(kitItemId: number, input: MaintenanceEntryInput): Observable<MaintenanceEntry> {
    return this.http.post<MaintenanceEntry>(`${KIT_PATH}/${kitItemId}/maintenance`, input);
  }

  /** Holds in whole days [from, to] of the co-op's calendar. */
  bookings(from: string, to: string, kitItemId: number | null): Observable<Booking[]> {
    let params = new HttpParams().set('from', from).set('to', to);
    if (kitItemId !== null) params = params.set('kitItemId', kitItemId);
    return this.http.get<Booking[]>(BOOKINGS_PATH, { params });
  }

  /** The caller's batches that are still under way, for linking a booking to one. */
  myBatches(): Observable<BatchSummary[]> {
    return this.http.get<BatchSummary[]>(BATCHES_PATH, { params: new HttpParams().set('mine', 'true') });
  }

  myBookings(): Observable<Booking[]> {
    return this.http.get<Booking[]>(`${BOOKINGS_PATH}/mine`);
  }

  book(request: CreateBookingRequest): Observable<Booking> {
    return this.http.post<Booking>(BOOKINGS_PATH, request);
  }

  move(bookingId: number, request: MoveBookingRequest): Observable<Booking> {
    return this.http.patch<Booking>(`${BOOKINGS_PATH}/${bookingId}`, request);
  }

  cancel(bookingId: number): Observable<void> {
    return this.http.delete<void>(`${BOOKINGS_PATH}/${bookingId}`);
  }

  feedLinkStatus(): Observable<BookingFeedLinkStatus> {
    return this.http.get<BookingFeedLinkStatus>(`${BOOKINGS_PATH}/feed-link`);
  }

  issueFeedLink(): Observable<BookingFeedLink> {
    return this.http.post<BookingFeedLink>(`${BOOKINGS_PATH}/feed-link`, null);
  }

  revokeFeedLink(): Observable<void> {
    return this.http.delete<void>(`${BOOKINGS_PATH}/feed-link`);
  }
}
