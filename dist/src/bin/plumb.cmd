@echo off
rem Runs Plumb from its bundle on Windows: this script in bin\, the jars in lib\. It needs Java 17
rem or newer, from JAVA_HOME or the PATH. The exit code is Plumb's own (0 clean, 1 findings,
rem 2 usage or file problems); 2 also when no Java that can run Plumb is found.
rem
rem Environment: JAVA_HOME (the Java to use), JAVA_OPTS (more JVM options, after ours, so your
rem own -Xmx wins), NO_COLOR (no colours; Plumb reads it itself).
setlocal EnableExtensions
set "PLUMB_ROOT=%~dp0.."
set "PLUMB_HOW=set JAVA_HOME to a Java 17 (or newer) installation, or put its bin folder first on the PATH"

if not exist "%PLUMB_ROOT%\lib\plumb.jar" goto no_jar

set "PLUMB_JAVA="
if defined JAVA_HOME set "PLUMB_JAVA=%JAVA_HOME%\bin\java.exe"
if not defined JAVA_HOME for %%j in (java.exe) do set "PLUMB_JAVA=%%~$PATH:j"
if not defined PLUMB_JAVA goto no_java
if not exist "%PLUMB_JAVA%" goto no_java_in_home

rem The Java's version from the release file of its home, so no JVM is started for it. A java.exe
rem without one (a shim on the PATH) is run as it is: Java itself then reports a version too old.
for %%j in ("%PLUMB_JAVA%") do set "PLUMB_JAVA_HOME=%%~dpj.."
set "PLUMB_JAVA_VERSION="
if exist "%PLUMB_JAVA_HOME%\release" for /f "usebackq tokens=1,* delims==" %%a in ("%PLUMB_JAVA_HOME%\release") do if "%%a"=="JAVA_VERSION" set "PLUMB_JAVA_VERSION=%%~b"
set "PLUMB_JAVA_FEATURE="
if defined PLUMB_JAVA_VERSION for /f "tokens=1,2 delims=._-+" %%a in ("%PLUMB_JAVA_VERSION%") do if "%%a"=="1" (set "PLUMB_JAVA_FEATURE=%%b") else (set "PLUMB_JAVA_FEATURE=%%a")
if not defined PLUMB_JAVA_FEATURE goto run
if %PLUMB_JAVA_FEATURE% LSS 17 goto old_java

:run
rem Plumb writes UTF-8 whatever the locale: the console shows it under code page 65001, which is
rem set for the run and put back afterwards.
set "PLUMB_CODE_PAGE="
for /f "tokens=2 delims=:." %%c in ('chcp') do set "PLUMB_CODE_PAGE=%%c"
if defined PLUMB_CODE_PAGE set "PLUMB_CODE_PAGE=%PLUMB_CODE_PAGE: =%"
if defined PLUMB_CODE_PAGE chcp 65001 >nul

rem A 1 GB heap holds any calc the 2 MiB size limit lets through. JVM warnings go to stderr, away
rem from `plumb lsp`'s protocol stream. JAVA_OPTS comes last, so a user's own options win.
rem Every command but `plumb lsp` is over in seconds: Java's quick compiler alone and its simple
rem collector need about a third less CPU there; the editor's server keeps Java's defaults.
set "PLUMB_QUICK=-XX:TieredStopAtLevel=1 -XX:+UseSerialGC"
if /i "%~1"=="lsp" set "PLUMB_QUICK="
"%PLUMB_JAVA%" -Xmx1g -Dfile.encoding=UTF-8 -Dstdout.encoding=UTF-8 -Dstderr.encoding=UTF-8 -Dsun.stdout.encoding=UTF-8 -Dsun.stderr.encoding=UTF-8 -Xlog:disable -Xlog:all=warning:stderr %PLUMB_QUICK% %JAVA_OPTS% -jar "%PLUMB_ROOT%\lib\plumb.jar" %*
set "PLUMB_EXIT=%ERRORLEVEL%"
if defined PLUMB_CODE_PAGE chcp %PLUMB_CODE_PAGE% >nul
exit /b %PLUMB_EXIT%

:no_jar
echo plumb: %PLUMB_ROOT%\lib\plumb.jar is missing: unpack the whole bundle, keeping bin and lib side by side 1>&2
exit /b 2

:no_java
echo plumb: needs Java 17 or newer, and there is no java on the PATH and no JAVA_HOME: %PLUMB_HOW% 1>&2
exit /b 2

:no_java_in_home
echo plumb: needs Java 17 or newer, but JAVA_HOME (%JAVA_HOME%) has no bin\java.exe: %PLUMB_HOW% 1>&2
exit /b 2

:old_java
echo plumb: needs Java 17 or newer, but %PLUMB_JAVA% is Java %PLUMB_JAVA_FEATURE%: %PLUMB_HOW% 1>&2
exit /b 2
