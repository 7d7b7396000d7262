import { ok, type Result } from '../result';
import { XmlStream } from './xml-stream';

/** The StartPart relationship type that points at a 3MF's root model (3MF core specification, appendix C.2). */
export const startPartType = 'http://schemas.microsoft.com/3dmanufacturing/2013/01/3dmodel';

/** The part name conventionally holding the root model (core specification §2.2). */
export const conventionalModelPart = '3D/3dmodel.model';

/**
 * The target of the package's StartPart relationship in `_rels/.rels` (Open Packaging Conventions),
 * or null when the part names none. Targets are resolved against the package root.
 */
export function startPartTarget(relsXml: Uint8Array): Result<string | null> {
  let target: string | null = null;
  const xml = new XmlStream('_rels/.rels', {
    open(tag) {
      const local = tag.name.slice(tag.name.indexOf(':') + 1);
      if (local !== 'Relationship' || target !== null) return;
      const type = tag.attributes.Type;
      const to = tag.attributes.Target;
      if (type?.trim() === startPartType && to) target = to.trim();
    },
    close() {},
  });
  const written = xml.write(relsXml);
  if (!written.ok) return written;
  const ended = xml.end();
  if (!ended.ok) return ended;
  return ok(target);
}
