import sharp from 'sharp';
import { Op } from 'sequelize';
import { ClassMentor, Enrolment, GuildClass } from '../../../server/features/classes/class.model';
import { Course, Lesson, Project } from '../../../server/features/courses/course.model';
import type { TestApp } from './test-app';

type Agent = Awaited<ReturnType<TestApp['signIn']>>['agent'];

/** A small JPEG of a brass-coloured plate; with `exif` it carries camera and GPS tags like a phone photo. */
export async function makeJpeg({
  width = 640,
  height = 480,
  exif = false,
  orientation,
}: { width?: number; height?: number; exif?: boolean; orientation?: number } = {}) {
  let img = sharp({ create: { width, height, channels: 3, background: { r: 168, g: 128, b: 47 } } }).jpeg({
    quality: 80,
  });
  if (exif) {
    img = img.withExif({
      IFD0: { Make: 'Saltmarsh Optics', Model: 'Bench Camera 7', DateTime: '2026:10:01 09:30:00' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '50/1 9/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '5/1 4/1 0/1' },
    });
  }
  const buf = await img.toBuffer();
  return orientation ? sharp(buf).withMetadata({ orientation }).jpeg().toBuffer() : buf;
}

export async function uploadPhoto(agent: Agent, bytes: Buffer, filename = 'plate.jpg') {
  return agent.post('/api/uploads').attach('file', bytes, { filename, contentType: 'image/jpeg' });
}

/** The first live project of a course, in lesson order. */
export async function firstProject(courseSlug = 'going-train-wall-regulator') {
  const course = (await Course.findOne({ where: { slug: courseSlug } }))!;
  const lessons = await Lesson.findAll({
    where: { courseId: course.id, retiredAt: null },
    order: [['position', 'ASC']],
  });
  const projects = await Project.findAll({
    where: { lessonId: { [Op.in]: lessons.map((l) => l.id) }, retiredAt: null },
  });
  const byLesson = new Map(projects.map((p) => [p.lessonId, p]));
  const project = lessons.map((l) => byLesson.get(l.id)).find(Boolean);
  if (!project) throw new Error(`no project in ${courseSlug}`);
  return project;
}

/** A class on a course with one mentor and the given apprentices enrolled. */
export async function makeClass(t: TestApp, courseSlug = 'going-train-wall-regulator', apprentices = 1) {
  const course = (await Course.findOne({ where: { slug: courseSlug } }))!;
  const cls = await GuildClass.create({
    name: `Class ${Math.random().toString(36).slice(2, 7)}`,
    courseId: course.id,
    startsOn: '2026-09-07',
    endsOn: '2026-12-18',
    capacity: 12,
  });
  const mentor = await t.signIn('mentor');
  await ClassMentor.create({ classId: cls.id, userId: mentor.user.id });
  const members = [];
  for (let i = 0; i < apprentices; i += 1) {
    const a = await t.signIn('apprentice');
    await Enrolment.create({ classId: cls.id, userId: a.user.id });
    members.push(a);
  }
  return { cls, course, mentor, apprentices: members };
}

/** An apprentice's piece with one photo, sent for review. */
export async function sentPiece(agent: Agent, projectId: number, photos = 1) {
  const uploadIds: number[] = [];
  for (let i = 0; i < photos; i += 1) uploadIds.push((await uploadPhoto(agent, await makeJpeg())).body.id);
  const created = await agent.post('/api/submissions').send({
    projectId,
    notes: 'Opened with the cutting broach from both faces.',
    photos: uploadIds.map((uploadId, i) => ({ uploadId, caption: `View ${i + 1}` })),
  });
  if (created.status !== 201) throw new Error(`create failed: ${created.status} ${JSON.stringify(created.body)}`);
  const sent = await agent.post(`/api/submissions/${created.body.id}/send`);
  if (sent.status !== 200) throw new Error(`send failed: ${sent.status} ${JSON.stringify(sent.body)}`);
  return { id: created.body.id as number, uploadIds };
}
