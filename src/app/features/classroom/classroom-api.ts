import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  AcceptInvitationResultSchema,
  ClassDetailSchema,
  ClassListSchema,
  InvitationPreviewSchema,
  InviteResultSchema,
  LessonListSchema,
  LessonReportSchema,
  LessonSchema,
  MyAnswerSchema,
  RosterSchema,
  type AcceptInvitationResult,
  type ClassDetail,
  type ClassList,
  type CreateLessonRequest,
  type DuplicateLessonRequest,
  type InvitationPreview,
  type InviteResult,
  type Lesson,
  type LessonList,
  type LessonReport,
  type MyAnswer,
  type Prediction,
  type Roster,
  type UpdateLessonRequest,
} from '../../../../shared/contracts/classroom';

/**
 * The classroom resources: `/api/classes`, `/api/lessons` and `/api/invitations`. Every answer is
 * parsed with the shared contract, so a server that drifts from it fails here, loudly.
 */
@Injectable({ providedIn: 'root' })
export class ClassroomApi {
  private readonly http = inject(HttpClient);

  /** Classes I teach, then classes I attend. */
  async classes(): Promise<ClassList> {
    return ClassListSchema.parse(await this.get('/api/classes'));
  }

  /** Creates a class I teach. */
  async createClass(name: string): Promise<ClassDetail> {
    return ClassDetailSchema.parse(
      await firstValueFrom(this.http.post<unknown>('/api/classes', { name })),
    );
  }

  /** A class and its lessons (students see the published ones). */
  async classDetail(classId: string): Promise<ClassDetail> {
    return ClassDetailSchema.parse(await this.get(`/api/classes/${classId}`));
  }

  /** Students and open invitations (the class's instructor). */
  async roster(classId: string): Promise<Roster> {
    return RosterSchema.parse(await this.get(`/api/classes/${classId}/roster`));
  }

  /** E-mails invitations; reports addresses already in the class. */
  async invite(classId: string, emails: string[]): Promise<InviteResult> {
    return InviteResultSchema.parse(
      await firstValueFrom(
        this.http.post<unknown>(`/api/classes/${classId}/invitations`, { emails }),
      ),
    );
  }

  /** Withdraws an open invitation. */
  async revokeInvitation(classId: string, invitationId: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/classes/${classId}/invitations/${invitationId}`));
  }

  /** Removes a student from a class. */
  async removeStudent(classId: string, userId: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/classes/${classId}/students/${userId}`));
  }

  /** My lesson library (lessons in no class). */
  async library(): Promise<LessonList> {
    return LessonListSchema.parse(await this.get('/api/lessons'));
  }

  /** Creates a lesson in the library or in a class I teach. */
  async createLesson(request: CreateLessonRequest): Promise<Lesson> {
    return LessonSchema.parse(
      await firstValueFrom(this.http.post<unknown>('/api/lessons', request)),
    );
  }

  /** A lesson as I may see it. */
  async lesson(lessonId: string): Promise<Lesson> {
    return LessonSchema.parse(await this.get(`/api/lessons/${lessonId}`));
  }

  /** Changes a lesson I own (publish, reveal, title…). */
  async updateLesson(lessonId: string, request: UpdateLessonRequest): Promise<Lesson> {
    return LessonSchema.parse(
      await firstValueFrom(this.http.patch<unknown>(`/api/lessons/${lessonId}`, request)),
    );
  }

  /** Deletes a lesson I own. */
  async deleteLesson(lessonId: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/lessons/${lessonId}`));
  }

  /** Copies a lesson I own into my library (classId null) or one of my classes. */
  async duplicateLesson(lessonId: string, request: DuplicateLessonRequest): Promise<Lesson> {
    return LessonSchema.parse(
      await firstValueFrom(this.http.post<unknown>(`/api/lessons/${lessonId}/duplicate`, request)),
    );
  }

  /** Saves my predictions (until I run the lesson). */
  async saveAnswer(lessonId: string, predictions: Prediction[]): Promise<MyAnswer> {
    return MyAnswerSchema.parse(
      await firstValueFrom(
        this.http.put<unknown>(`/api/lessons/${lessonId}/answer`, { predictions }),
      ),
    );
  }

  /** Runs the lesson's system against my saved predictions. */
  async run(lessonId: string): Promise<MyAnswer> {
    return MyAnswerSchema.parse(
      await firstValueFrom(this.http.post<unknown>(`/api/lessons/${lessonId}/run`, {})),
    );
  }

  /** Every student's predictions against the simulation (the lesson's owner). */
  async report(lessonId: string): Promise<LessonReport> {
    return LessonReportSchema.parse(await this.get(`/api/lessons/${lessonId}/report`));
  }

  /** What an invitation link offers (no sign-in needed). */
  async invitation(token: string): Promise<InvitationPreview> {
    return InvitationPreviewSchema.parse(
      await this.get(`/api/invitations/${encodeURIComponent(token)}`),
    );
  }

  /** Joins the class of an invitation as the signed-in user. */
  async acceptInvitation(token: string): Promise<AcceptInvitationResult> {
    return AcceptInvitationResultSchema.parse(
      await firstValueFrom(
        this.http.post<unknown>(`/api/invitations/${encodeURIComponent(token)}/accept`, {}),
      ),
    );
  }

  private get(url: string): Promise<unknown> {
    return firstValueFrom(this.http.get<unknown>(url));
  }
}
