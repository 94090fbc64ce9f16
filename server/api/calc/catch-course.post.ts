import { catchCourseBody } from '#shared/schemas/applications'
import { catchCourse653, catchLengthFromRevolutions, courseLengthForFraction } from '#shared/utils/application'

// The course helper: ounces to catch on 653 ft, the length of a fraction of an acre, the length of N wheel turns.
export default defineEventHandler(async (event) => {
  await requireMember(event)
  const b = await validBody(event, catchCourseBody)
  return {
    ouncesOn653Ft: b.lbPerAcre !== undefined ? catchCourse653({ lbPerAcre: b.lbPerAcre, rowWidthIn: b.rowSpacingIn }).ounces : null,
    lengthFtForFraction: b.fractionOfAcre !== undefined ? courseLengthForFraction({ widthIn: b.rowSpacingIn, fractionOfAcre: b.fractionOfAcre }).lengthFt : null,
    lengthFtFromRevolutions: b.revolutions !== undefined ? catchLengthFromRevolutions({ revolutions: b.revolutions, wheelCircumferenceIn: b.wheelCircumferenceIn! }).lengthFt : null,
  }
})
