#pragma once
// The translation context of every sheet string: Sheet::tr("...") looks up "beamwarden::sheet::Sheet" in
// translations/beamwarden_de.ts, the same context lupdate gives these calls.
#include <QCoreApplication>

namespace beamwarden::sheet {

struct Sheet {
    Q_DECLARE_TR_FUNCTIONS(beamwarden::sheet::Sheet)
};

} // namespace beamwarden::sheet
