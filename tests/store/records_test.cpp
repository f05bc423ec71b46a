// Record vocabulary shared by the store and the lab export: class names and the assessment status rules
// (vocabulary.md: draft -> in review -> approved, or withdrawn; an approved assessment is never edited).
#include "beamwarden/model/records.hpp"

#include <catch2/catch.hpp>

using namespace beamwarden::model;

TEST_CASE("Assessment status moves only along the allowed paths", "[store][records]")
{
    using enum AssessmentStatus;
    CHECK(isAllowedTransition(Draft, InReview));
    CHECK(isAllowedTransition(InReview, Approved));
    CHECK(isAllowedTransition(InReview, Draft));
    CHECK(isAllowedTransition(Draft, Withdrawn));
    CHECK_FALSE(isAllowedTransition(Draft, Approved)); // approval needs a review first
    CHECK_FALSE(isAllowedTransition(Approved, Draft)); // an approved assessment is never edited
    CHECK_FALSE(isAllowedTransition(Withdrawn, Draft));
}

TEST_CASE("Status and class names round-trip", "[store][records]")
{
    for (const auto status : {AssessmentStatus::Draft, AssessmentStatus::InReview, AssessmentStatus::Approved,
                              AssessmentStatus::Withdrawn})
        CHECK(parseAssessmentStatus(toString(status)).value() == status);
    CHECK(parseLaserClass("3B").value() == LaserClass::Class3B);
    CHECK(parseLaserClass("Class 4").value() == LaserClass::Class4);
    CHECK_FALSE(parseLaserClass("5").has_value());
}
