// The large lab's assessments: years of reviews of each laser, most approved through review, some withdrawn, the
// latest in review or still a draft, each with the sign-offs that moved it. People and comments are invented.
#include "largelabparts.hpp"

#include <fmt/core.h>

#include <array>

namespace beamwarden::bench {

namespace {

using model::AssessmentStatus;

constexpr std::array kAuthors{"A. Brannock",   "M. Tessaro", "J. Quillfeather",
                              "S. Varga-Holm", "P. Ardent",  "K. Oyelaran-Smit"};
constexpr const char* kOfficer = "Dr. T. Quennell";
constexpr std::array kOccasions{"Annual review",      "New sample stage",  "Beam path rebuilt",     "Power upgrade",
                                "New user induction", "Enclosure changed", "Moved to another table"};

// "YYYY-MM-DDTHH:MM:SSZ" for a day counted from 1970-01-01 (the proleptic Gregorian calendar).
std::string isoTime(long days, int minuteOfDay)
{
    // Days to civil date (the well-known era algorithm): exact for any day after 1970.
    days += 719468;
    const long era = days / 146097;
    const long dayOfEra = days - era * 146097;
    const long yearOfEra = (dayOfEra - dayOfEra / 1460 + dayOfEra / 36524 - dayOfEra / 146096) / 365;
    const long dayOfYear = dayOfEra - (365 * yearOfEra + yearOfEra / 4 - yearOfEra / 100);
    const long mp = (5 * dayOfYear + 2) / 153;
    const long day = dayOfYear - (153 * mp + 2) / 5 + 1;
    const long month = mp < 10 ? mp + 3 : mp - 9;
    const long year = yearOfEra + era * 400 + (month <= 2 ? 1 : 0);
    return fmt::format("{:04}-{:02}-{:02}T{:02}:{:02}:00Z", year, month, day, minuteOfDay / 60, minuteOfDay % 60);
}

model::SignOff move(std::string who, std::string when, AssessmentStatus from, AssessmentStatus to, std::string comment)
{
    return model::SignOff{0, std::move(who), std::move(when), from, to, std::move(comment)};
}

} // namespace

std::vector<model::Assessment> makeHistory(Random& random, const model::Laser& laser, int count,
                                           const std::string& snapshot, const std::string& results)
{
    std::vector<model::Assessment> history;
    history.reserve(static_cast<std::size_t>(count));
    constexpr long kFirstDay = 16436; // 2015-01-01
    constexpr long kSpanDays = 4380;  // twelve years
    int lastApproved = -1;
    for (int i = 0; i < count; ++i) {
        model::Assessment a;
        a.laserId = laser.id;
        const long day = kFirstDay + kSpanDays * i / std::max(count, 1) + random.index(20);
        const int minute = 8 * 60 + random.index(9 * 60);
        const std::string author = kAuthors.at(static_cast<std::size_t>(random.index(kAuthors.size())));
        a.title =
            fmt::format("{}: {}", kOccasions.at(static_cast<std::size_t>(random.index(kOccasions.size()))), laser.name);
        a.ruleSet = "strictest";
        a.programVersion = fmt::format("0.{}.{}", 1 + i * 9 / std::max(count, 1), random.index(4));
        a.author = author;
        a.created = isoTime(day, minute);
        a.updated = isoTime(day + 1 + random.index(10), minute);
        a.inputSnapshot = snapshot;
        a.results = results;
        const std::string review = isoTime(day + 2 + random.index(5), minute + 30);
        const std::string decision = isoTime(day + 8 + random.index(5), minute + 45);
        const bool newest = i == count - 1;
        const bool secondNewest = i == count - 2;
        if (newest) {
            a.status = AssessmentStatus::Draft; // being written
        } else if (secondNewest) {
            a.signOffs.push_back(move(author, review, AssessmentStatus::Draft, AssessmentStatus::InReview,
                                      "Ready for the officer's review."));
            a.status = AssessmentStatus::InReview;
        } else if (random.chance(0.12)) {
            a.signOffs.push_back(move(author, review, AssessmentStatus::Draft, AssessmentStatus::InReview,
                                      "Please check the diffuse case."));
            a.signOffs.push_back(move(kOfficer, decision, AssessmentStatus::InReview, AssessmentStatus::Withdrawn,
                                      "Superseded by the rebuilt beam path."));
            a.status = AssessmentStatus::Withdrawn;
        } else {
            a.signOffs.push_back(move(author, review, AssessmentStatus::Draft, AssessmentStatus::InReview,
                                      "Figures checked against the data sheet."));
            if (random.chance(0.15)) { // sent back once, then approved
                a.signOffs.push_back(move(kOfficer, decision, AssessmentStatus::InReview, AssessmentStatus::Draft,
                                          "Add the case at the sample stage."));
                a.signOffs.push_back(move(author, isoTime(day + 14, minute), AssessmentStatus::Draft,
                                          AssessmentStatus::InReview, "Case added."));
            }
            a.signOffs.push_back(move(kOfficer, isoTime(day + 20, minute + 50), AssessmentStatus::InReview,
                                      AssessmentStatus::Approved, "Approved; eyewear on the door as listed."));
            a.status = AssessmentStatus::Approved;
            lastApproved = i;
        }
        history.push_back(std::move(a));
    }
    // Every approval but the last describes a laser that has changed since.
    for (int i = 0; i < lastApproved; ++i) {
        if (history[static_cast<std::size_t>(i)].status == AssessmentStatus::Approved)
            history[static_cast<std::size_t>(i)].outOfDate = true;
    }
    return history;
}

} // namespace beamwarden::bench
