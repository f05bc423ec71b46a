// Entry point of the GUI suite: one QApplication for all cases, on the offscreen platform so no display is needed.
#define CATCH_CONFIG_RUNNER
#include <catch2/catch.hpp>

#include <QApplication>
#include <QStandardPaths>

int main(int argc, char* argv[])
{
    qputenv("QT_QPA_PLATFORM", "offscreen");
    QStandardPaths::setTestModeEnabled(true);
    int qtArgc = 1;
    QApplication app(qtArgc, argv);
    return Catch::Session().run(argc, argv);
}
