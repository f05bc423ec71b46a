#include "beamwarden/model/records.hpp"

#include <array>

namespace beamwarden::model {

namespace {

constexpr std::array<std::string_view, 9> kClassNames{"unknown", "1", "1M", "1C", "2", "2M", "3R", "3B", "4"};
constexpr std::array<std::string_view, 4> kStatusNames{"draft", "in review", "approved", "withdrawn"};

} // namespace

std::string_view toString(LaserClass laserClass)
{
    return kClassNames[static_cast<std::size_t>(laserClass)];
}

Result<LaserClass> parseLaserClass(std::string_view text)
{
    if (text.starts_with("Class "))
        text.remove_prefix(6);
    for (std::size_t i = 0; i < kClassNames.size(); ++i) {
        if (text == kClassNames[i])
            return static_cast<LaserClass>(i);
    }
    return fail("class", std::string(text), "unknown, 1, 1M, 1C, 2, 2M, 3R, 3B or 4");
}

std::string_view toString(AssessmentStatus status)
{
    return kStatusNames[static_cast<std::size_t>(status)];
}

Result<AssessmentStatus> parseAssessmentStatus(std::string_view text)
{
    for (std::size_t i = 0; i < kStatusNames.size(); ++i) {
        if (text == kStatusNames[i])
            return static_cast<AssessmentStatus>(i);
    }
    return fail("status", std::string(text), "draft, in review, approved or withdrawn");
}

bool isAllowedTransition(AssessmentStatus from, AssessmentStatus to)
{
    using enum AssessmentStatus;
    switch (from) {
    case Draft: return to == InReview || to == Withdrawn;
    case InReview: return to == Approved || to == Draft || to == Withdrawn;
    case Approved: return to == Withdrawn;
    case Withdrawn: return false;
    }
    return false;
}

} // namespace beamwarden::model
